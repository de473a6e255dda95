import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { verifyPassword } from '@/lib/auth/password';
import { reserveAttempt, restrictionsStarted, settleSuccess } from '@/lib/auth/sign-in-throttle';
import { User, database } from '@/lib/db';
import { InvalidRequestError } from '@/lib/http/app-errors';

/**
 * The signed-in user's password, asked again before an act that cannot be undone (countersigning, revoking).
 * Re-entering it has its own budget, keyed on the signed-in user: anonymous sign-in failures for the same address
 * cannot block the act, and this form cannot be used to guess more passwords than sign-in allows.
 */
export async function confirmPassword({ user, password, act, now = Date.now() }: { user: SessionUser; password: string; act: 'Countersigning' | 'Revoking a certificate'; now?: number }): Promise<User> {
  const reservation = await reserveAttempt([{ scope: 'countersign', subject: user.id }], now);
  const account = await User.findByPk(user.id);
  if (!account || !account.passwordHash || !(await verifyPassword(account.passwordHash, password))) {
    const verb = act === 'Countersigning' ? 'countersign' : 'revoke';
    await database().transaction(async (transaction) => {
      await recordAuditEvent({ actorId: user.id, action: `user.${verb}-password-failed`, entityType: 'user', entityId: user.id }, transaction);
      if (restrictionsStarted(reservation).length) await recordAuditEvent({ actorId: user.id, action: `user.${verb}-locked-out`, entityType: 'user', entityId: user.id }, transaction);
    });
    throw new InvalidRequestError([{ path: 'password', message: `That is not your password. ${act} needs the password you sign in with.` }], 'The password did not match.');
  }
  await database().transaction((transaction) => settleSuccess(reservation, transaction));
  return account;
}
