import type { SessionUser } from '@/lib/auth/current-session';
import type { Revision } from '@/lib/db';

// A planning officer reads certified work only: drafts, submitted, returned and withdrawn revisions of a certified
// scheme do not exist for them, on any page or in any answer. Every other role that may read the scheme sees them all.

const PLANNING_READS: readonly Revision['status'][] = ['countersigned'];

export function mayReadRevision(user: Pick<SessionUser, 'role'>, revision: Pick<Revision, 'status'>): boolean {
  return user.role !== 'planning' || PLANNING_READS.includes(revision.status);
}

/** A `where` clause on revisions for this user: empty, or the statuses a planning officer may read. */
export function readableRevisionWhere(user: Pick<SessionUser, 'role'>): { status?: Revision['status'][] } {
  return user.role === 'planning' ? { status: [...PLANNING_READS] } : {};
}
