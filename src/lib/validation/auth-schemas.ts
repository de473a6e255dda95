import { z } from 'zod';
import { ROLES } from '@/lib/auth/roles';
import { singleLineText } from './plain-text';

// One schema per form, used by react-hook-form in the browser and by the server action on the server.

const email = singleLineText('your e-mail address', { missing: 'Enter an e-mail address.' }).toLowerCase().min(1, 'Enter an e-mail address.').max(254, 'An e-mail address has at most 254 characters.').email('Enter an e-mail address like name@example.org.');

export const signInSchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password.').max(200, 'A password has at most 200 characters.'),
  next: z.string().max(500).optional(),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const roleSchema = z.enum(ROLES, { message: 'Choose one of the five roles.' });

export const inviteUserSchema = z.object({
  email,
  name: singleLineText('the person’s name').min(2, 'Enter the person’s name (at least 2 characters).').max(120, 'A name has at most 120 characters.'),
  role: roleSchema,
});
export type InviteUserInput = z.infer<typeof inviteUserSchema>;

export const newPasswordSchema = z
  .string()
  .min(12, 'Use at least 12 characters.')
  .max(200, 'A password has at most 200 characters.');

export const acceptInvitationSchema = z
  .object({
    token: z.string().min(20, 'This invitation link is incomplete.').max(200),
    password: newPasswordSchema,
    confirmPassword: z.string(),
  })
  .refine((v) => v.password === v.confirmPassword, { path: ['confirmPassword'], message: 'The two passwords differ.' });
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

export const changeRoleSchema = z.object({
  userId: z.string().min(1, 'Choose a user.').max(64),
  role: roleSchema,
});
export type ChangeRoleInput = z.infer<typeof changeRoleSchema>;

export const setUserActiveSchema = z.object({ userId: z.string().min(1, 'Choose a user.').max(64), active: z.boolean('must be true (reactivate) or false (deactivate)') });
export type SetUserActiveInput = z.infer<typeof setUserActiveSchema>;

export const invitationIdSchema = z.object({ invitationId: z.string().min(1, 'Choose an invitation.').max(64) });
