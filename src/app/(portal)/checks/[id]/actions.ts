'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { addReviewComment } from '@/lib/review/add-review-comment';
import { countersignRevision } from '@/lib/review/countersign-revision';
import { returnRevision } from '@/lib/review/return-revision';
import { countersignSchema, returnRevisionSchema, reviewCommentSchema } from '@/lib/validation/check-schemas';

// Only checkers act here; each use case also refuses the revision's own designer (four-eyes rule).

export const addReviewCommentAction = authorizedAction({ roles: ['checker'], schema: reviewCommentSchema }, async (input, checker) => {
  const result = await addReviewComment({ input, checker });
  revalidatePath(`/checks/${input.revisionId}`);
  return result;
});

export const returnRevisionAction = authorizedAction({ roles: ['checker'], schema: returnRevisionSchema }, async (input, checker) => {
  const result = await returnRevision({ input, checker, baseUrl: portalBaseUrl() });
  revalidatePath(`/checks/${input.revisionId}`);
  revalidatePath('/checks');
  return result;
});

export const countersignRevisionAction = authorizedAction({ roles: ['checker'], schema: countersignSchema }, async (input, checker) => {
  const result = await countersignRevision({ input, checker, baseUrl: portalBaseUrl() });
  revalidatePath(`/checks/${input.revisionId}`);
  revalidatePath('/checks');
  revalidatePath('/certificates');
  return result;
});
