'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { editLetterResponse } from '@/lib/letters/edit-letter-response';
import { logLetterResponse } from '@/lib/letters/log-letter-response';
import { makeReminder } from '@/lib/letters/make-reminder';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { editResponseSchema, letterIdSchema, logResponseSchema } from '@/lib/validation/letter-schemas';

export const logLetterResponseAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: logResponseSchema }, async (input, user) => {
  const result = await logLetterResponse({ user, input });
  revalidatePath('/liaison', 'layout');
  return result;
});

export const editLetterResponseAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: editResponseSchema }, async (input, user) => {
  const result = await editLetterResponse({ user, input });
  revalidatePath('/liaison', 'layout');
  return result;
});

export const makeReminderAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: letterIdSchema }, async (input, user) => {
  const result = await makeReminder({ user, letterId: input.letterId });
  revalidatePath('/liaison', 'layout');
  revalidatePath('/home');
  return result;
});
