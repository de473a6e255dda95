import type { AuditTrailEntry } from '@/lib/audit/list-audit-events';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { localDateTime } from '@/lib/dates/calendar-dates';

/**
 * The events as stacked cards on a narrow screen and as aligned rows on a wide one: the sentences are long, and a
 * table would make a phone scroll sideways for every one.
 */
export function AuditEventList({ entries }: { entries: AuditTrailEntry[] }) {
  const timeZone = portalTimeZone();
  return (
    <ol aria-label="Audit events, newest first" className="divide-y divide-paper-edge border-y border-paper-edge text-sm">
      {entries.map((e) => (
        <li key={e.number} className="grid gap-1 py-3 md:grid-cols-[6rem_13rem_12rem_1fr] md:gap-3">
          <p className="num text-ink-faint">Event {e.number}</p>
          <p className="num"><time dateTime={e.at}>{localDateTime(timeZone, e.at, { seconds: true })}</time></p>
          <p className="font-semibold">{e.who}</p>
          <div className="min-w-0">
            <p className="break-words">{e.what}</p>
            {e.scheme ? <p className="text-ink-soft">Scheme {e.scheme}</p> : null}
            <p className="num truncate text-xs text-ink-faint" title={e.hash}>Hash {e.hash.slice(0, 16)}…</p>
          </div>
        </li>
      ))}
    </ol>
  );
}
