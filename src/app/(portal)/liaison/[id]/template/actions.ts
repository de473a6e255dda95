'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { previewLetter } from '@/lib/letters/preview-letter';
import { saveLetterTemplate } from '@/lib/letters/save-letter-template';
import { LIAISON_MANAGERS, LIAISON_READERS } from '@/lib/parcels/liaison-roles';
import { previewLetterSchema, saveLetterTemplateSchema } from '@/lib/validation/letter-schemas';

export const saveLetterTemplateAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: saveLetterTemplateSchema }, async (input, user) => {
  const result = await saveLetterTemplate({ user, input });
  revalidatePath(`/liaison/${input.schemeId}/template`);
  return result;
});

/** Reading only: anyone who may read the scheme's letters may preview one. */
export const previewLetterAction = authorizedAction({ roles: LIAISON_READERS, schema: previewLetterSchema }, async (input, user) => previewLetter({ user, input, baseUrl: await portalBaseUrl() }));
