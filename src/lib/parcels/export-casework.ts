import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { LetterResponse } from '@/lib/db';
import { calendarDateIn } from '@/lib/dates/calendar-dates';
import type { ResponseChannel, ResponseType } from '@/lib/db/models/letter';
import { listLetterTracking } from '@/lib/letters/list-letter-tracking';
import { RESPONSE_CHANNELS, RESPONSE_TYPES } from '@/lib/validation/letter-schemas';
import { impactCsv, registerCsv, trackingCsv } from './casework-csv';
import { computeParcelImpact } from './compute-parcel-impact';
import { loadParcelRegister } from './load-parcel-register';

export type CaseworkTable = 'register' | 'impact' | 'tracking';

const STATUS_WORDS: Record<string, string> = { queued: 'Queued', sending: 'Sending', sent: 'Sent', failed: 'Failed', acknowledged: 'Acknowledged', held: 'Held, not sent', 'to-post': 'To post', posted: 'Posted', withdrawn: 'Withdrawn' };

/** One of the scheme's casework tables as CSV, with the file name to save it under; access as for reading the register. */
export async function exportCasework({ user, schemeId, table, revisionId }: { user: SessionUser; schemeId: string; table: CaseworkTable; revisionId?: string }) {
  const { scheme, parcels } = await loadParcelRegister({ user, schemeId });
  const name = (what: string) => `${scheme.reference}-${what}.csv`.replace(/[^A-Za-z0-9._-]/g, '-');
  if (table === 'register') return { csv: registerCsv(parcels), fileName: name('parcels-register') };
  if (table === 'impact') {
    const impact = await computeParcelImpact({ user, schemeId, revisionId });
    return { csv: impactCsv(impact), fileName: name(`impact-revision-${impact.revision?.number ?? 'none'}`) };
  }
  const tracking = await listLetterTracking({ user, schemeId });
  const timeZone = portalTimeZone();
  const ids = tracking.parcels.flatMap((p) => p.letters.map((l) => l.id));
  const responses = await LetterResponse.findAll({ where: { letterId: ids }, order: [['receivedAt', 'DESC'], ['createdAt', 'DESC']] });
  const rows = tracking.parcels.flatMap((p) =>
    p.letters.map((l) => ({
      parcelReference: p.reference,
      ownerName: p.ownerName,
      letterVersion: l.version,
      revisionNumber: l.revisionNumber,
      status: STATUS_WORDS[l.status] ?? l.status,
      sentOn: l.postedOn ?? (l.sentAt ? calendarDateIn(timeZone, l.sentAt) : null),
      dueOn: l.responseDueOn,
      responses: responses.filter((r) => r.letterId === l.id).map((r) => ({ receivedOn: r.receivedAt.slice(0, 10), type: RESPONSE_TYPES[r.responseType as ResponseType], channel: RESPONSE_CHANNELS[r.channel as ResponseChannel], summary: r.summary })),
    })),
  );
  return { csv: trackingCsv(rows), fileName: name('letters-tracking') };
}
