import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { verifyPassword } from '@/lib/auth/password';
import { clearFailures, lockedForMs, recordFailure } from '@/lib/auth/sign-in-throttle';
import { User } from '@/lib/db';
import { InvalidRequestError, ThrottledError } from '@/lib/http/app-errors';

/**
 * The signed-in user's password, asked again before an act that cannot be undone (countersigning, revoking).
 * Wrong passwords here count with the sign-in failures of the same address, so the form cannot be used to guess one.
 */
export async function confirmPassword({ user, password, act }: { user: SessionUser; password: string; act: string }): Promise<User> {
  const address = user.email.toLowerCase();
  const waitMs = lockedForMs(address);
  if (waitMs > 0) throw new ThrottledError(`Too many wrong passwords. Try again in ${Math.ceil(waitMs / 60000)} minute(s).`);
  const account = await User.findByPk(user.id);
  if (!account || !account.passwordHash || !(await verifyPassword(account.passwordHash, password))) {
    recordFailure(address);
    throw new InvalidRequestError([{ path: 'password', message: `That is not your password. ${act} needs the password you sign in with.` }], 'The password did not match.');
  }
  clearFailures(address);
  return account;
}
