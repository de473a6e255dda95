import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision, Scheme, User, database } from '@/lib/db';
import { evaluateCaseOffThread } from '@/lib/engine-pool/engine-pool';
import { caseIssuesInWords } from '@/lib/case-words/case-issue-words';
import { ConflictError, InvalidRequestError, NotFoundError, UnprocessableError } from '@/lib/http/app-errors';
import { ENGINE_VERSION } from '@/lib/hydraulics/version';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { queueMail } from '@/lib/mail/queue-mail';
import { parseCase } from '@/lib/validation/parse-case';
import { frozenCaseFile, inputsSha256, resultsSha256, revisionSha256 } from './revision-hashes';

export interface SubmitForCheckOptions {
  revisionId: string;
  /** A chosen checker, or null to put the revision in the checkers' queue. */
  checkerId: string | null;
  designer: SessionUser;
  baseUrl: string;
}

async function chosenChecker(checkerId: string | null, authorId: string, transaction?: Transaction) {
  if (!checkerId) return null;
  const checker = await User.findByPk(checkerId, { transaction });
  if (!checker || checker.role !== 'checker' || checker.status !== 'active') throw new InvalidRequestError([{ path: 'checkerId', message: 'Choose an active checker from the list, or leave the revision to the queue.' }]);
  if (checker.id === authorId) throw new InvalidRequestError([{ path: 'checkerId', message: 'The checker must be someone other than the designer of the revision.' }]);
  return checker;
}

/** The draft as it stands, checked for submission: the designer's, still a draft, with a valid checker and complete inputs. */
async function submittableDraft(revisionId: string, designer: SessionUser, checkerId: string | null, transaction?: Transaction) {
  const revision = await Revision.findByPk(revisionId, { transaction });
  const scheme = revision ? await Scheme.findByPk(revision.schemeId, { transaction }) : null;
  if (!revision || !scheme || scheme.designerId !== designer.id) throw new NotFoundError('There is no such revision among your schemes.');
  if (revision.status !== 'draft') throw new ConflictError(`Revision ${revision.number} is ${revision.status}; only a draft can be submitted for check.`);
  const checker = await chosenChecker(checkerId, revision.authorId, transaction);
  const caseFile = frozenCaseFile(revision.inputsJson);
  const parsed = parseCase(caseFile);
  if (!parsed.ok) throw new UnprocessableError('The draft is not complete enough to check: finish these fields in the scheme’s wizard first.', caseIssuesInWords(parsed.issues, caseFile));
  return { revision, scheme, checker, caseFile, caseInput: parsed.value };
}

/**
 * Freezes a draft and sends it for independent check: the engine evaluates the inputs once more, and the inputs,
 * results, engine version and their SHA-256 hashes are stored (a database trigger keeps them unchanged from then on).
 */
export async function submitForCheck({ revisionId, checkerId, designer, baseUrl }: SubmitForCheckOptions) {
  const sequelize = database();
  // The engine runs before the write transaction, so a long evaluation holds no database lock.
  const draft = await submittableDraft(revisionId, designer, checkerId);
  const results = await evaluateCaseOffThread(draft.caseInput);
  const submitted = await sequelize.transaction(async (transaction) => {
    const { revision, scheme, checker, caseFile } = await submittableDraft(revisionId, designer, checkerId, transaction);
    if (revision.inputsJson !== draft.revision.inputsJson) throw new ConflictError('The draft changed while it was being evaluated: submit it again.');
    const submittedAt = new Date().toISOString();
    const hashes = { inputsSha256: inputsSha256(caseFile), resultsSha256: resultsSha256(results) };
    const frozen = { schemeId: scheme.id, number: revision.number, authorId: revision.authorId, engineVersion: ENGINE_VERSION, submittedAt, ...hashes };
    const revisionHash = revisionSha256(frozen);
    await revision.update({ status: 'submitted', resultsJson: JSON.stringify(results), ...hashes, revisionSha256: revisionHash, engineVersion: ENGINE_VERSION, checkerId: checker?.id ?? null, submittedAt, updatedAt: submittedAt }, { transaction });
    await recordAuditEvent(
      { actorId: designer.id, action: 'revision.submitted', entityType: 'revision', entityId: revision.id, schemeId: scheme.id, details: { number: revision.number, checkerId: checker?.id ?? null, queue: !checker, engineVersion: ENGINE_VERSION, ...hashes, revisionSha256: revisionHash } },
      transaction,
    );
    const recipients = checker ? [checker] : await User.findAll({ where: { role: 'checker', status: 'active', id: { [Op.ne]: revision.authorId } }, transaction });
    const link = `${baseUrl}/checks/${revision.id}`;
    const mail = await queueMail(
      {
        purpose: 'revision.submitted',
        messages: recipients.map((r) => ({
          to: r.email,
          subject: `Sillmark: ${scheme.reference} revision ${revision.number} is waiting for check`,
          text: `Hello ${r.name},\n\n${designer.name} has submitted revision ${revision.number} of ${scheme.reference} ${scheme.name} (${scheme.watercourse} at ${scheme.site}) for independent check${checker ? ' and chosen you as its checker' : '. It is in the checkers’ queue'}.\n\nOpen the check here:\n${link}\n\nSHA-256 of the frozen revision: ${revisionHash}\n`,
        })),
      },
      transaction,
    );
    return { revision, checker, revisionHash, mail };
  });
  const { revision, checker } = submitted;
  const notified = await deliverOutboundMail({ ids: submitted.mail });
  return { revisionId: revision.id, status: revision.status, checkerId: checker?.id ?? null, queue: !checker, revisionSha256: submitted.revisionHash, notified: notified.delivered };
}
