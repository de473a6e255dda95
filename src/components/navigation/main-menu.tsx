'use client';

import { Menu, X } from 'lucide-react';
import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { useEffect, useState } from 'react';
import type { NavigationLink } from '@/lib/auth/navigation';

/** The main navigation: a row of links on a wide screen, a menu button that opens them on a phone. */
export function MainMenu({ links }: { links: NavigationLink[] }) {
  const [open, setOpen] = useState(false);
  const pathname = usePathname();
  useEffect(() => setOpen(false), [pathname]);
  return (
    <nav aria-label="Main" className="order-last w-full md:order-none md:w-auto">
      <button type="button" className="inline-flex items-center gap-2 rounded border border-paper-edge px-3 py-1 text-sm md:hidden" aria-expanded={open} aria-controls="main-menu-links" onClick={() => setOpen(!open)}>
        {open ? <X aria-hidden="true" className="h-4 w-4" /> : <Menu aria-hidden="true" className="h-4 w-4" />}
        Menu
      </button>
      <ul id="main-menu-links" className={`${open ? 'mt-2 flex' : 'hidden'} flex-col gap-3 text-sm md:mt-0 md:flex md:flex-row md:flex-wrap md:gap-5`}>
        {links.map((link) => (
          <li key={link.href}><Link className="hover:text-accent hover:underline" aria-current={pathname === link.href ? 'page' : undefined} href={link.href}>{link.label}</Link></li>
        ))}
      </ul>
    </nav>
  );
}
