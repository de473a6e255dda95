'use server';

import { cookies } from 'next/headers';
import { publicAction } from '@/lib/actions/authorized-action';
import { lucia } from '@/lib/auth/lucia';
import { sameOriginPath } from '@/lib/auth/same-origin-path';
import { signIn } from '@/lib/auth/sign-in';
import { publicUrl } from '@/lib/config/public-url';
import { clientAddress } from '@/lib/http/client-address';
import { signInSchema } from '@/lib/validation/auth-schemas';

export const signInAction = publicAction(signInSchema, async (input) => {
  const store = await cookies();
  const { cookie } = await signIn({ email: input.email, password: input.password, previousSessionId: store.get(lucia().sessionCookieName)?.value ?? null, clientAddress: await clientAddress() });
  store.set(cookie.name, cookie.value, cookie.attributes);
  return { next: sameOriginPath(input.next, publicUrl().origin) };
});
