import 'server-only';
import { Op } from 'sequelize';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { Letter, LetterResponse, Parcel, Revision, Scheme, database } from '@/lib/db';
import { type DeadlineStanding, calendarDateIn, deadlineStanding } from '@/lib/dates/calendar-dates';

export interface FollowUpLetter {
  letterId: string;
  schemeId: string;
  schemeReference: string;
  parcelReference: string;
  ownerName: string;
  dueOn: string;
  standing: Extract<DeadlineStanding, 'overdue' | 'due-soon'>;
}

/** Cap on the letters a home page lists; the letters page of each scheme has them all. */
const MAX_LISTED = 50;

/**
 * Letters that went out (e-mailed or posted), have no response and are past or within a week of their deadline,
 * soonest deadline first. `today` is the calendar date in the portal's time zone unless given.
 */
export async function listFollowUp({ today = calendarDateIn(portalTimeZone(), new Date()) }: { today?: string } = {}): Promise<FollowUpLetter[]> {
  database();
  const letters = await Letter.findAll({ where: { status: ['sent', 'posted'], responseDueOn: { [Op.ne]: null } }, order: [['responseDueOn', 'ASC']] });
  const answered = new Set((await LetterResponse.findAll({ where: { letterId: letters.map((l) => l.id) }, attributes: ['letterId'] })).map((r) => r.letterId));
  const due = letters
    .map((l) => ({ letter: l, standing: deadlineStanding({ dueOn: l.responseDueOn as string, today, answered: answered.has(l.id) }) }))
    .filter((x): x is { letter: Letter; standing: FollowUpLetter['standing'] } => x.standing === 'overdue' || x.standing === 'due-soon')
    .slice(0, MAX_LISTED);
  const parcels = new Map((await Parcel.findAll({ where: { id: due.map((d) => d.letter.parcelId) } })).map((p) => [p.id, p]));
  const revisions = new Map((await Revision.findAll({ where: { id: due.map((d) => d.letter.revisionId) }, attributes: ['id', 'schemeId'] })).map((r) => [r.id, r.schemeId]));
  const schemes = new Map((await Scheme.findAll({ where: { id: [...new Set(revisions.values())] } })).map((s) => [s.id, s]));
  return due.map(({ letter, standing }) => {
    const schemeId = revisions.get(letter.revisionId) ?? '';
    const parcel = parcels.get(letter.parcelId);
    return { letterId: letter.id, schemeId, schemeReference: schemes.get(schemeId)?.reference ?? '?', parcelReference: parcel?.reference ?? '?', ownerName: parcel?.ownerName ?? '?', dueOn: letter.responseDueOn as string, standing };
  });
}
