import 'server-only';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { User, database } from '@/lib/db';
import { AppError } from '@/lib/http/app-errors';
import { lucia } from './lucia';
import { decoyPasswordHash, verifyPassword } from './password';
import { reserveAttempt, restrictionsStarted, settleSuccess, type AttemptKey, type Reservation } from './sign-in-throttle';
import { THROTTLE_RULES } from './throttle-rules';

export class InvalidCredentialsError extends AppError {
  constructor() {
    super('That e-mail address and password do not match an active account.', 401);
  }
}

export interface SignInOptions {
  email: string;
  password: string;
  /** The session id the browser presented, if any: it is invalidated so a planted session cannot be kept (fixation). */
  previousSessionId?: string | null;
  /** The client's network address (src/lib/http/client-address.ts). */
  clientAddress: string;
  now?: number;
}

function signInKeys(address: string, client: string): AttemptKey[] {
  return [
    { scope: 'account-client', subject: `${address}\u0000${client}` },
    { scope: 'account', subject: address },
    { scope: 'client', subject: client },
  ];
}

/** Verifies the password and opens a new session. Wrong password, unknown and inactive accounts all fail alike. */
export async function signIn({ email, password, previousSessionId, clientAddress, now = Date.now() }: SignInOptions) {
  const address = email.trim().toLowerCase();
  const reservation = await reserveAttempt(signInKeys(address, clientAddress), now);

  const sequelize = database();
  const user = await User.findOne({ where: { email: address } });
  const passwordOk = await verifyPassword(user?.passwordHash ?? (await decoyPasswordHash()), password);
  if (!user || !passwordOk || user.status !== 'active' || !user.passwordHash) {
    await sequelize.transaction((transaction) => recordFailure(user, reservation, transaction));
    throw new InvalidCredentialsError();
  }
  if (previousSessionId) await lucia().invalidateSession(previousSessionId);
  const session = await lucia().createSession(user.id, {});
  await sequelize.transaction(async (transaction) => {
    await settleSuccess(reservation, transaction);
    await recordAuditEvent({ actorId: user.id, action: 'user.signed-in', entityType: 'user', entityId: user.id }, transaction);
  });
  return { session, cookie: lucia().createSessionCookie(session.id), user };
}

// The typed address is not kept: a mistyped e-mail field may hold a password. A known account is named by its id.
async function recordFailure(user: User | null, reservation: Reservation, transaction: Transaction): Promise<void> {
  const entityId = user?.id ?? null;
  const reason = !user ? 'unknown account' : user.status !== 'active' ? 'account not active' : 'wrong password';
  await recordAuditEvent({ actorId: null, action: 'user.sign-in-failed', entityType: 'user', entityId, details: { reason } }, transaction);
  for (const scope of restrictionsStarted(reservation)) {
    await recordAuditEvent({ actorId: null, action: 'user.sign-in-locked-out', entityType: 'user', entityId, details: { scope, kind: THROTTLE_RULES[scope].kind } }, transaction);
  }
}
