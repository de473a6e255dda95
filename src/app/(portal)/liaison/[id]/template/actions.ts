'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { saveLetterTemplate } from '@/lib/letters/save-letter-template';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { saveLetterTemplateSchema } from '@/lib/validation/letter-schemas';

export const saveLetterTemplateAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: saveLetterTemplateSchema }, async (input, user) => {
  const result = await saveLetterTemplate({ user, input });
  revalidatePath(`/liaison/${input.schemeId}/template`);
  return result;
});
