import 'server-only';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { calendarDateIn, localDateTime } from './calendar-dates';

// For server components (and the public pages, which have no session): times and days in the portal's zone, read
// from the setting on the server, so no client hook is needed and every page agrees with the letters.

/** "3 Dec 2026, 14:05 GMT", or a dash when there is no time. */
export function portalTime(iso: string | null | undefined): string {
  return iso ? localDateTime(portalTimeZone(), iso) : '—';
}

/** The calendar date (YYYY-MM-DD) an instant falls on in the portal's zone. */
export function portalDate(iso: string): string {
  return calendarDateIn(portalTimeZone(), iso);
}
