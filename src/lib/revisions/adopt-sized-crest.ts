import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { database } from '@/lib/db';
import { UnprocessableError } from '@/lib/http/app-errors';
import { findEditableRevision } from '@/lib/schemes/scheme-access';
import { changedFields } from './changed-fields';
import { caseFileOf, decodeDraft, encodeDraft } from './draft-inputs';
import { evaluateDraft } from './evaluate-draft';

/** Writes the engine's sized crest (highest sill or shortest crest that passes every limit) into the draft's structure. */
export async function adoptSizedCrest({ revisionId, user }: { revisionId: string; user: SessionUser }) {
  await findEditableRevision(user, revisionId);
  const evaluation = await evaluateDraft({ revisionId, user });
  if (evaluation.status !== 'evaluated') throw new UnprocessableError('The draft cannot be evaluated yet, so there is no sized crest to adopt.', evaluation.issues);
  const sizing = evaluation.result.sizing;
  if (!sizing) throw new UnprocessableError('Crest sizing was not asked for: choose what to size in step 6, thresholds and limits.', [{ path: 'sizing', message: 'is not set' }]);
  if (sizing.value === null) throw new UnprocessableError(`No crest in the range searched passes every limit: ${sizing.reason}.`, [{ path: 'sizing', message: sizing.reason }]);
  const value = sizing.value;
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const { scheme, revision } = await findEditableRevision(user, revisionId, transaction);
    const before = decodeDraft(revision.inputsJson);
    if (before.control?.type !== 'weir') throw new UnprocessableError('The structure has no crest to size.', [{ path: 'control', message: 'is not a weir' }]);
    const from = before.control[sizing.vary] ?? null;
    const after = { ...before, control: { ...before.control, [sizing.vary]: value } };
    const changed = changedFields(caseFileOf(before), caseFileOf(after));
    if (changed.length > 0) {
      await revision.update({ inputsJson: encodeDraft(after), resultsJson: null, engineVersion: null, updatedAt: new Date().toISOString() }, { transaction });
      await recordAuditEvent({ actorId: user.id, action: 'revision.crest-adopted', entityType: 'revision', entityId: revision.id, schemeId: scheme.id, details: { number: revision.number, field: `control.${sizing.vary}`, from, to: value } }, transaction);
    }
    return { revisionId: revision.id, field: sizing.vary, from, to: value };
  });
}
