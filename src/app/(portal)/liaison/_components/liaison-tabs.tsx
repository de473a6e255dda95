'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

const TABS = [
  { path: '', label: 'Overview' },
  { path: '/register', label: 'Parcels register' },
  { path: '/upload', label: 'Upload CSV', manageOnly: true },
  { path: '/impact', label: 'Impact on parcels' },
  { path: '/plan', label: 'Plan of the parcels' },
  { path: '/template', label: 'Letter template' },
  { path: '/letters', label: 'Letters' },
];

export function LiaisonTabs({ schemeId, manage }: { schemeId: string; manage: boolean }) {
  const pathname = usePathname();
  const base = `/liaison/${schemeId}`;
  const current = TABS.filter((t) => pathname === `${base}${t.path}` || (t.path && pathname.startsWith(`${base}${t.path}/`))).pop();
  return (
    <nav aria-label="Landowner liaison for this scheme" className="mb-8 border-b border-paper-edge">
      <ul className="flex flex-wrap gap-x-6 gap-y-2 text-sm">
        {TABS.filter((t) => manage || !t.manageOnly).map((t) => {
          const active = current?.path === t.path;
          return (
            <li key={t.path}>
              <Link href={`${base}${t.path}`} aria-current={active ? 'page' : undefined} className={`inline-block border-b-2 pb-2 ${active ? 'border-accent font-semibold text-accent' : 'border-transparent text-ink-soft hover:text-accent'}`}>
                {t.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
