'use server';

import { publicAction } from '@/lib/actions/authorized-action';
import { acceptInvitation } from '@/lib/users/accept-invitation';
import { acceptInvitationSchema } from '@/lib/validation/auth-schemas';

export const acceptInvitationAction = publicAction(acceptInvitationSchema, acceptInvitation);
