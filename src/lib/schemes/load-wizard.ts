import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';
import { decodeDraft } from '@/lib/revisions/draft-inputs';
import { findReadableScheme, isEditable } from './scheme-access';

/** What the wizard opens on: the scheme's open draft (draft or returned), else its latest revision, read-only. */
export async function loadWizard({ schemeId, user }: { schemeId: string; user: SessionUser }) {
  const scheme = await findReadableScheme(user, schemeId);
  const revisions = await Revision.findAll({ where: { schemeId }, order: [['number', 'DESC']] });
  const revision = revisions.find(isEditable) ?? revisions[0];
  if (!revision) throw new NotFoundError(`Scheme ${scheme.reference} has no revision yet.`);
  const editable = user.role === 'designer' && scheme.designerId === user.id && isEditable(revision);
  return { scheme, revision, inputs: decodeDraft(revision.inputsJson), editable };
}
export type LoadedWizard = Awaited<ReturnType<typeof loadWizard>>;
