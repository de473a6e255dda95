'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { createScheme } from '@/lib/schemes/create-scheme';
import { newSchemeSchema } from '@/lib/validation/scheme-schemas';

export const createSchemeAction = authorizedAction({ roles: ['designer'], schema: newSchemeSchema }, async (input, designer) => {
  const created = await createScheme({ input, designer });
  revalidatePath('/schemes');
  return created;
});
