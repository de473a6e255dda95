'use server';

import { headers } from 'next/headers';
import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { changeUserRole } from '@/lib/users/change-user-role';
import { inviteUser } from '@/lib/users/invite-user';
import { changeRoleSchema, inviteUserSchema } from '@/lib/validation/auth-schemas';

async function baseUrl(): Promise<string> {
  if (process.env.PUBLIC_URL) return process.env.PUBLIC_URL.replace(/\/$/, '');
  const h = await headers();
  return `${h.get('x-forwarded-proto') ?? 'http'}://${h.get('host') ?? 'localhost:3000'}`;
}

export const inviteUserAction = authorizedAction({ roles: ['admin'], schema: inviteUserSchema }, async (input, admin) => {
  const result = await inviteUser({ input, admin, baseUrl: await baseUrl() });
  revalidatePath('/admin/users');
  return result;
});

export const changeRoleAction = authorizedAction({ roles: ['admin'], schema: changeRoleSchema }, async (input, admin) => {
  const result = await changeUserRole({ input, admin });
  revalidatePath('/admin/users');
  return result;
});
