import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { database } from '@/lib/db';
import { portalDate } from '@/lib/dates/portal-time';
import { ConflictError, InvalidRequestError } from '@/lib/http/app-errors';
import type { MarkPostedInput } from '@/lib/validation/letter-schemas';
import { requireLetterAccess } from './load-letter';

/** Records that a letter to post was put in the post, and on which day; it cannot be posted before it was made. */
export async function markLetterPosted({ user, input }: { user: SessionUser; input: MarkPostedInput }) {
  return database().transaction(async (transaction) => {
    const { letter, scheme } = await requireLetterAccess({ user, letterId: input.letterId, manage: true, transaction });
    if (letter.status !== 'to-post') throw new ConflictError(letter.status === 'posted' ? 'This letter is marked posted already.' : 'Only a letter to post (its parcel has no e-mail address) can be marked posted.');
    const madeOn = portalDate(letter.createdAt);
    if (input.postedOn < madeOn) throw new InvalidRequestError([{ path: 'postedOn', message: `must be on or after ${madeOn}, the day the letter was made` }]);
    await letter.update({ status: 'posted', postedOn: input.postedOn, sentAt: `${input.postedOn}T00:00:00.000Z` }, { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'letter.posted', entityType: 'letter', entityId: letter.id, schemeId: scheme.id, details: { postedOn: input.postedOn } }, transaction);
    return { letterId: letter.id, postedOn: input.postedOn };
  });
}
