'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { adoptSizedCrest } from '@/lib/revisions/adopt-sized-crest';
import { startDraftFromRevision } from '@/lib/revisions/start-draft-from-revision';
import { adoptCrestSchema, startDraftSchema } from '@/lib/validation/scheme-schemas';

export const startDraftAction = authorizedAction({ roles: ['designer'], schema: startDraftSchema }, async (input, user) => {
  const draft = await startDraftFromRevision({ revisionId: input.revisionId, user });
  revalidatePath(`/schemes/${draft.schemeId}`);
  return draft;
});

export const adoptSizedCrestAction = authorizedAction({ roles: ['designer'], schema: adoptCrestSchema }, async (input, user) => {
  const adopted = await adoptSizedCrest({ revisionId: input.revisionId, user });
  revalidatePath('/schemes', 'layout');
  return adopted;
});
