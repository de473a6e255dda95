import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';
import { listCarriedComments } from '@/lib/review/list-carried-comments';
import { decodeDraft } from '@/lib/revisions/draft-inputs';
import { frozenIntegrity } from '@/lib/revisions/frozen-integrity';
import { findReadableScheme, isEditable } from './scheme-access';

/**
 * What the wizard opens on: the scheme's open draft, with the checker's comments on the revision it answers;
 * else its latest revision, read-only (a returned revision stays frozen) with its hashes checked.
 */
export async function loadWizard({ schemeId, user }: { schemeId: string; user: SessionUser }) {
  const scheme = await findReadableScheme(user, schemeId);
  const revisions = await Revision.findAll({ where: { schemeId }, order: [['number', 'DESC']] });
  const revision = revisions.find(isEditable) ?? revisions[0];
  if (!revision) throw new NotFoundError(`Scheme ${scheme.reference} has no revision yet.`);
  const editable = user.role === 'designer' && scheme.designerId === user.id && isEditable(revision);
  const carried = isEditable(revision) ? await listCarriedComments(revision) : null;
  return { scheme, revision, inputs: decodeDraft(revision.inputsJson), editable, carried, integrity: frozenIntegrity(revision) };
}
export type LoadedWizard = Awaited<ReturnType<typeof loadWizard>>;
