import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { database } from '@/lib/db';
import { lucia } from './lucia';

/** Ends this session, or every session of the user ("sign out everywhere"); returns the blank cookie to set. */
export async function signOut(options: { sessionId: string; userId: string; everywhere?: boolean }) {
  if (options.everywhere) await lucia().invalidateUserSessions(options.userId);
  else await lucia().invalidateSession(options.sessionId);
  await database().transaction((transaction) =>
    recordAuditEvent({ actorId: options.userId, action: 'user.signed-out', entityType: 'user', entityId: options.userId, details: { everywhere: options.everywhere ?? false } }, transaction),
  );
  return lucia().createBlankSessionCookie();
}
