'use client';

import { localDateTime } from '@/lib/dates/calendar-dates';
import { usePortalTimeZone } from './time-zone-context';

/** A moment in the portal's time zone, with the zone's abbreviation; the ISO instant stays in the markup. */
export function LocalTime({ iso }: { iso: string | null }) {
  const timeZone = usePortalTimeZone();
  if (!iso) return <span className="num">—</span>;
  return <time className="num" dateTime={iso} suppressHydrationWarning>{localDateTime(timeZone, iso)}</time>;
}
