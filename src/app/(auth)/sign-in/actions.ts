'use server';

import { cookies } from 'next/headers';
import { publicAction } from '@/lib/actions/authorized-action';
import { lucia } from '@/lib/auth/lucia';
import { signIn } from '@/lib/auth/sign-in';
import { signInSchema } from '@/lib/validation/auth-schemas';

function safeNext(next: string | undefined): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/home';
}

export const signInAction = publicAction(signInSchema, async (input) => {
  const store = await cookies();
  const { cookie } = await signIn({ email: input.email, password: input.password, previousSessionId: store.get(lucia().sessionCookieName)?.value ?? null });
  store.set(cookie.name, cookie.value, cookie.attributes);
  return { next: safeNext(input.next) };
});
