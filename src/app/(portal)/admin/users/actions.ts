'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { changeUserRole } from '@/lib/users/change-user-role';
import { inviteUser } from '@/lib/users/invite-user';
import { cancelInvitation, resendInvitation } from '@/lib/users/manage-invitation';
import { setUserActive } from '@/lib/users/set-user-active';
import { changeRoleSchema, invitationIdSchema, inviteUserSchema, setUserActiveSchema } from '@/lib/validation/auth-schemas';

export const inviteUserAction = authorizedAction({ roles: ['admin'], schema: inviteUserSchema }, async (input, admin) => {
  const result = await inviteUser({ input, admin, baseUrl: portalBaseUrl() });
  revalidatePath('/admin/users');
  return result;
});

export const changeRoleAction = authorizedAction({ roles: ['admin'], schema: changeRoleSchema }, async (input, admin) => {
  const result = await changeUserRole({ input, admin });
  revalidatePath('/admin/users');
  return result;
});

export const setUserActiveAction = authorizedAction({ roles: ['admin'], schema: setUserActiveSchema }, async (input, admin) => {
  const result = await setUserActive({ input, admin });
  revalidatePath('/admin/users');
  return result;
});

export const resendInvitationAction = authorizedAction({ roles: ['admin'], schema: invitationIdSchema }, async (input, admin) => {
  const result = await resendInvitation({ invitationId: input.invitationId, admin, baseUrl: portalBaseUrl() });
  revalidatePath('/admin/users');
  return result;
});

export const cancelInvitationAction = authorizedAction({ roles: ['admin'], schema: invitationIdSchema }, async (input, admin) => {
  const result = await cancelInvitation({ invitationId: input.invitationId, admin });
  revalidatePath('/admin/users');
  return result;
});
