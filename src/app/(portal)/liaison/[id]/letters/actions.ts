'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { generateLetters } from '@/lib/letters/generate-letters';
import { markLetterPosted } from '@/lib/letters/mark-letter-posted';
import { resendLetter } from '@/lib/letters/resend-letter';
import { withdrawLetterBatch } from '@/lib/letters/withdraw-letter-batch';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { batchIdSchema, generateLettersSchema, letterIdSchema, markPostedSchema } from '@/lib/validation/letter-schemas';

export const generateLettersAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: generateLettersSchema }, async (input, user) => {
  const result = await generateLetters({ user, input, baseUrl: await portalBaseUrl() });
  revalidatePath(`/liaison/${input.schemeId}/letters`);
  return result;
});

export const withdrawBatchAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: batchIdSchema }, async (input, user) => {
  const result = await withdrawLetterBatch({ user, batchId: input.batchId });
  revalidatePath('/liaison', 'layout');
  return result;
});

export const resendLetterAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: letterIdSchema }, async (input, user) => {
  const result = await resendLetter({ user, letterId: input.letterId });
  revalidatePath('/liaison', 'layout');
  return result;
});

export const markPostedAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: markPostedSchema }, async (input, user) => {
  const result = await markLetterPosted({ user, input });
  revalidatePath('/liaison', 'layout');
  return result;
});
