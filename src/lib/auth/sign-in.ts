import 'server-only';
import { AppError, ThrottledError } from '@/lib/http/app-errors';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { User, database } from '@/lib/db';
import { lucia } from './lucia';
import { decoyPasswordHash, verifyPassword } from './password';
import { clearFailures, lockedForMs, recordFailure } from './sign-in-throttle';

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
}

/** Verifies the password and opens a new session. Wrong password, unknown and inactive accounts all fail alike. */
export async function signIn({ email, password, previousSessionId }: SignInOptions) {
  const address = email.trim().toLowerCase();
  const waitMs = lockedForMs(address);
  if (waitMs > 0) throw new ThrottledError(`Too many failed sign-ins for this address. Try again in ${Math.ceil(waitMs / 60000)} minute(s).`);

  const sequelize = database();
  const user = await User.findOne({ where: { email: address } });
  const passwordOk = await verifyPassword(user?.passwordHash ?? (await decoyPasswordHash()), password);
  if (!user || !passwordOk || user.status !== 'active' || !user.passwordHash) {
    recordFailure(address);
    throw new InvalidCredentialsError();
  }
  clearFailures(address);
  if (previousSessionId) await lucia().invalidateSession(previousSessionId);
  const session = await lucia().createSession(user.id, {});
  await sequelize.transaction((transaction) => recordAuditEvent({ actorId: user.id, action: 'user.signed-in', entityType: 'user', entityId: user.id }, transaction));
  return { session, cookie: lucia().createSessionCookie(session.id), user };
}
