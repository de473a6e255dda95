import type { ReactNode } from 'react';
import Link from 'next/link';
import { getCurrentSession } from '@/lib/auth/current-session';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { BrandMark } from '@/components/navigation/brand-mark';
import { TimeZoneProvider } from '@/components/ui/time-zone-context';

// The verification page is public: its own light shell, with a way into the portal for those who have an account.
// Its times are in the portal's zone, handed to the client parts (the upload's report) as the portal's layout does.
export default async function VerifyLayout({ children }: { children: ReactNode }) {
  const { user } = await getCurrentSession();
  return (
    <>
      <header className="border-b border-paper-edge bg-paper">
        <div className="mx-auto flex max-w-sheet flex-wrap items-center justify-between gap-4 px-6 py-3">
          <Link href="/" className="inline-flex items-center gap-2 text-lg font-semibold tracking-tight"><BrandMark /> Sillmark</Link>
          <p className="text-sm">{user ? <Link className="text-accent underline" href="/home">Back to the portal ({user.name})</Link> : <Link className="text-accent underline" href="/sign-in?next=/verify">Sign in</Link>}</p>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-sheet px-6 py-8"><TimeZoneProvider timeZone={portalTimeZone()}>{children}</TimeZoneProvider></main>
    </>
  );
}
