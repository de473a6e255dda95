'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { saveParcelEdits } from '@/lib/parcels/save-parcel-edits';
import { saveParcelsSchema } from '@/lib/validation/parcel-schemas';

export const saveParcelEditsAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: saveParcelsSchema }, async (input, user) => {
  const result = await saveParcelEdits({ user, input });
  revalidatePath(`/liaison/${input.schemeId}`, 'layout');
  return result;
});
