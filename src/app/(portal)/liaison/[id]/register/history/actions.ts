'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { restoreRegisterVersion } from '@/lib/parcels/restore-register-version';
import { restoreRegisterSchema } from '@/lib/validation/register-schemas';

export const restoreRegisterVersionAction = authorizedAction({ roles: LIAISON_MANAGERS, schema: restoreRegisterSchema }, async (input, user) => {
  const result = await restoreRegisterVersion({ user, input });
  revalidatePath(`/liaison/${input.schemeId}`, 'layout');
  return result;
});
