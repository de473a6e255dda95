import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { findReadableRevision, isEditable } from '@/lib/schemes/scheme-access';
import { decodeDraft } from './draft-inputs';

/** A revision's inputs as the wizard reads them, with whether this user may still change them. */
export async function loadDraft({ revisionId, user }: { revisionId: string; user: SessionUser }) {
  const { scheme, revision } = await findReadableRevision(user, revisionId);
  return {
    scheme: { id: scheme.id, reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site, description: scheme.description },
    revision: {
      id: revision.id,
      number: revision.number,
      status: revision.status,
      wizardStep: revision.wizardStep,
      editable: user.role === 'designer' && scheme.designerId === user.id && isEditable(revision),
      hasResults: revision.resultsJson !== null,
      updatedAt: revision.updatedAt,
    },
    inputs: decodeDraft(revision.inputsJson),
  };
}
export type LoadedDraft = Awaited<ReturnType<typeof loadDraft>>;
