import Link from 'next/link';
import type { NavigationLink } from '@/lib/auth/navigation';
import { SignOutButton } from './sign-out-button';

export function PortalHeader({ links, userName, roleLabel }: { links: NavigationLink[]; userName: string; roleLabel: string }) {
  return (
    <header className="border-b border-paper-edge bg-paper">
      <div className="mx-auto flex max-w-sheet flex-wrap items-center justify-between gap-4 px-6 py-3">
        <Link href="/home" className="text-lg font-semibold tracking-tight">
          <span className="text-accent" aria-hidden="true">▁▁▔▔</span> Sillmark
        </Link>
        <nav aria-label="Main">
          <ul className="flex flex-wrap gap-5 text-sm">
            {links.map((link) => (
              <li key={link.href}><Link className="hover:text-accent hover:underline" href={link.href}>{link.label}</Link></li>
            ))}
          </ul>
        </nav>
        <div className="text-right">
          <p className="text-sm"><span className="font-semibold">{userName}</span> · <span data-testid="current-role">{roleLabel}</span></p>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
