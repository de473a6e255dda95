'use client';

import { type ReactNode, createContext, useContext } from 'react';
import { DEFAULT_TIME_ZONE } from '@/lib/config/portal-time-zone';

// The portal's time zone (a server setting) handed to client components, so every time on screen uses it.
const TimeZoneContext = createContext<string>(DEFAULT_TIME_ZONE);

export function TimeZoneProvider({ timeZone, children }: { timeZone: string; children: ReactNode }) {
  return <TimeZoneContext.Provider value={timeZone}>{children}</TimeZoneContext.Provider>;
}

export const usePortalTimeZone = () => useContext(TimeZoneContext);
