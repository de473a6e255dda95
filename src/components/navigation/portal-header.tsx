import Link from 'next/link';
import type { NavigationLink } from '@/lib/auth/navigation';
import { BrandMark } from './brand-mark';
import { MainMenu } from './main-menu';
import { SignOutButton } from './sign-out-button';

export function PortalHeader({ links, userName, roleLabel }: { links: NavigationLink[]; userName: string; roleLabel: string }) {
  return (
    <header className="border-b border-paper-edge bg-paper print:hidden">
      <div className="mx-auto flex max-w-sheet flex-wrap items-center justify-between gap-x-4 gap-y-2 px-4 py-3 sm:px-6">
        <Link href="/home" className="inline-flex items-center gap-2 text-lg font-semibold tracking-tight">
          <BrandMark /> Sillmark
        </Link>
        <MainMenu links={links} />
        <div className="text-right">
          <p className="text-sm"><span className="font-semibold">{userName}</span> · <span data-testid="current-role">{roleLabel}</span></p>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
