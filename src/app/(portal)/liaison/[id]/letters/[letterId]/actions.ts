'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { logLetterResponse } from '@/lib/letters/log-letter-response';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { logResponseSchema } from '@/lib/validation/letter-schemas';

export const logLetterResponseAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: logResponseSchema }, async (input, user) => {
  const result = await logLetterResponse({ user, input });
  revalidatePath('/liaison', 'layout');
  return result;
});
