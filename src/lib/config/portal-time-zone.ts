// The portal's time zone (PORTAL_TIME_ZONE, an IANA name; default Europe/London): every time on screen and every
// letter date is given in it. Forms keep ISO dates (YYYY-MM-DD). No 'server-only': client pages format with it too.

export const DEFAULT_TIME_ZONE = 'Europe/London';

export class TimeZoneSettingError extends Error {}

/** Whether Intl knows the zone (the ICU data shipped with Node has every IANA zone). */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

export function portalTimeZone(): string {
  const name = process.env.PORTAL_TIME_ZONE?.trim() || DEFAULT_TIME_ZONE;
  if (!isTimeZone(name)) throw new TimeZoneSettingError(`PORTAL_TIME_ZONE must be a time zone name such as Europe/London (it is "${name}").`);
  return name;
}
