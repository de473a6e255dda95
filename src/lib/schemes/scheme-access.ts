import 'server-only';
import type { Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { Certificate, Revision, Scheme, database } from '@/lib/db';
import { ConflictError, ForbiddenError, NotFoundError } from '@/lib/http/app-errors';
import { mayReadRevision } from './revision-visibility';

// Who may see or change a scheme. Someone without the right to a scheme is told it does not exist (404),
// so scheme ids cannot be probed; only the wrong role for the whole action is a 403.


async function mayRead(user: SessionUser, scheme: Scheme, transaction?: Transaction): Promise<boolean> {
  if (user.role === 'designer') return scheme.designerId === user.id;
  if (user.role === 'planning') return (await Certificate.count({ where: { schemeId: scheme.id }, transaction })) > 0;
  return true;
}

export async function findReadableScheme(user: SessionUser, schemeId: string, transaction?: Transaction): Promise<Scheme> {
  database();
  const scheme = await Scheme.findByPk(schemeId, { transaction });
  if (!scheme || !(await mayRead(user, scheme, transaction))) throw new NotFoundError('There is no such scheme, or it is not yours to see.');
  return scheme;
}

export async function findReadableRevision(user: SessionUser, revisionId: string, transaction?: Transaction): Promise<{ scheme: Scheme; revision: Revision }> {
  database();
  const revision = await Revision.findByPk(revisionId, { transaction });
  // A planning officer reads certified work only: a later draft of a certified scheme stays hidden, as on the pages.
  if (!revision || !mayReadRevision(user, revision)) throw new NotFoundError('There is no such revision, or it is not yours to see.');
  const scheme = await findReadableScheme(user, revision.schemeId, transaction).catch((error: unknown) => {
    throw error instanceof NotFoundError ? new NotFoundError('There is no such revision, or it is not yours to see.') : error;
  });
  return { scheme, revision };
}

/** The scheme's own designer, and a revision still open for editing (draft, or returned by the checker). */
export async function findEditableRevision(user: SessionUser, revisionId: string, transaction?: Transaction): Promise<{ scheme: Scheme; revision: Revision }> {
  if (user.role !== 'designer') throw new ForbiddenError('Only the scheme’s designer edits its drafts.');
  const found = await findReadableRevision(user, revisionId, transaction);
  assertEditable(found.revision);
  return found;
}

export function isEditable(revision: Pick<Revision, 'status'>): boolean {
  return revision.status === 'draft';
}

export function assertEditable(revision: Revision): void {
  if (!isEditable(revision)) {
    const why = revision.status === 'returned' ? 'was returned by the checker and stays frozen as it was submitted' : `is ${revision.status} and read-only`;
    throw new ConflictError(`Revision ${revision.number} ${why}. Start a new draft from revision ${revision.number} to make changes.`);
  }
}
