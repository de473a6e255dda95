import 'server-only';
import { Op, type Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import type { CertificateParties } from '@/lib/certificates/certificate-draft';
import { Revision, User } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import { revisionForCheck } from './revision-for-check';

/** The frozen hashes the checker's re-run read: the revision must still carry them when the decision is recorded. */
export type CheckedHashes = Pick<Revision, 'inputsSha256' | 'resultsSha256' | 'revisionSha256'>;

/** Said when the revision was decided by someone else between the checker's first read and the recording. */
async function refuseIfDecidedMeanwhile(revisionId: string, checker: SessionUser, transaction: Transaction): Promise<void> {
  const revision = await Revision.findByPk(revisionId, { transaction });
  if (!revision || revision.status === 'submitted') return;
  if (revision.status === 'countersigned') {
    const by = revision.checkerId === checker.id ? ' (by you, in another window)' : ' by another checker';
    throw new ConflictError(`Revision ${revision.number} has just been countersigned${by}, so this countersignature was not recorded.`);
  }
  throw new ConflictError(`Revision ${revision.number} is now ${revision.status}, no longer waiting for check, so this countersignature was not recorded.`);
}

/**
 * The records a countersignature and its certificate are made from, read in `transaction` with every rule checked:
 * the revision is submitted, not the checker's own work nor another checker's, no later revision is certified, and
 * (given `checked`) its frozen hashes are those the re-run read. Read once before the certificate is made and again
 * in the recording transaction, so that nothing that changed meanwhile is recorded.
 */
export async function countersignParties({ revisionId, checker, checked, transaction }: { revisionId: string; checker: SessionUser; checked?: CheckedHashes; transaction: Transaction }): Promise<CertificateParties> {
  if (checked) await refuseIfDecidedMeanwhile(revisionId, checker, transaction);
  const { revision, scheme } = await revisionForCheck(revisionId, checker, transaction);
  if (checked && (revision.inputsSha256 !== checked.inputsSha256 || revision.resultsSha256 !== checked.resultsSha256 || revision.revisionSha256 !== checked.revisionSha256)) {
    throw new ConflictError('The revision changed while it was being checked; open it again.');
  }
  const later = await Revision.count({ where: { schemeId: scheme.id, status: 'countersigned', number: { [Op.gt]: revision.number } }, transaction });
  if (later > 0) throw new ConflictError(`A later revision of ${scheme.reference} is already certified; this one can no longer be.`);
  const designer = await User.findByPk(revision.authorId, { transaction });
  if (!designer) throw new NotFoundError('The designer of this revision no longer exists.');
  const checkerAccount = await User.findByPk(checker.id, { transaction });
  if (!checkerAccount) throw new NotFoundError('Your account no longer exists.');
  return { revision, scheme, designer, checker: checkerAccount };
}
