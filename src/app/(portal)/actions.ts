'use server';

import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { z } from 'zod';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { getCurrentSession } from '@/lib/auth/current-session';
import { signOut } from '@/lib/auth/sign-out';

export const signOutAction = authorizedAction({ roles: ANY_ROLE, schema: z.object({ everywhere: z.boolean().default(false) }) }, async (input, user) => {
  const { session } = await getCurrentSession();
  const cookie = await signOut({ sessionId: session!.id, userId: user.id, everywhere: input.everywhere });
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
  redirect('/sign-in');
});
