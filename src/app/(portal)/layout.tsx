import type { ReactNode } from 'react';
import { FocusMainHeading } from '@/components/navigation/focus-main-heading';
import { PortalHeader } from '@/components/navigation/portal-header';
import { navigationFor } from '@/lib/auth/navigation';
import { requirePageRole } from '@/lib/auth/page-guard';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { ROLE_LABELS } from '@/lib/auth/roles';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { TimeZoneProvider } from '@/components/ui/time-zone-context';

export default async function PortalLayout({ children }: { children: ReactNode }) {
  const user = await requirePageRole(ANY_ROLE);
  return (
    <TimeZoneProvider timeZone={portalTimeZone()}>
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-white focus:p-2">Skip to content</a>
      <PortalHeader links={navigationFor(user.role)} userName={user.name} roleLabel={ROLE_LABELS[user.role]} />
      <main id="main" className="mx-auto max-w-sheet px-4 py-8 sm:px-6">{children}</main>
      <FocusMainHeading />
      <footer className="mx-auto max-w-sheet px-4 pb-10 text-xs text-ink-faint sm:px-6">
        Sillmark supports, and never replaces, a licensed engineer’s judgement and the local codes and regulations.
      </footer>
    </TimeZoneProvider>
  );
}
