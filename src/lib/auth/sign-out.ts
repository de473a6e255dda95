import 'server-only';
import { lucia } from './lucia';

/** Ends this session, or every session of the user ("sign out everywhere"); returns the blank cookie to set. */
export async function signOut(options: { sessionId: string; userId: string; everywhere?: boolean }) {
  if (options.everywhere) await lucia().invalidateUserSessions(options.userId);
  else await lucia().invalidateSession(options.sessionId);
  return lucia().createBlankSessionCookie();
}
