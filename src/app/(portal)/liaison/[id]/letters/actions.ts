'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { generateLetters } from '@/lib/letters/generate-letters';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { generateLettersSchema } from '@/lib/validation/letter-schemas';

export const generateLettersAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: generateLettersSchema }, async (input, user) => {
  const result = await generateLetters({ user, input, baseUrl: await portalBaseUrl() });
  revalidatePath(`/liaison/${input.schemeId}/letters`);
  return result;
});
