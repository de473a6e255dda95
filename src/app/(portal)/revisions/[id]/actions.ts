'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { submitForCheckSchema } from '@/lib/validation/check-schemas';

export const submitForCheckAction = authorizedAction({ roles: ['designer'], schema: submitForCheckSchema }, async (input, designer) => {
  const result = await submitForCheck({ revisionId: input.revisionId, checkerId: input.checkerId || null, designer, baseUrl: portalBaseUrl() });
  revalidatePath(`/revisions/${input.revisionId}`);
  return result;
});
