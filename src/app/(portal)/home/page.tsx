import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { requirePageRole } from '@/lib/auth/page-guard';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { ROLE_DUTIES, ROLE_LABELS } from '@/lib/auth/roles';
import { type HomeItem, loadRoleHome } from '@/lib/home/load-role-home';

export const metadata: Metadata = { title: 'Home' };

function ItemTitle({ item }: { item: HomeItem }) {
  const className = 'text-accent underline hover:text-accent-strong';
  if (!item.href) return item.title;
  // A file is fetched only when clicked: a prefetched <Link> would download it (and log the download) on every visit.
  if (item.download) return <a className={className} href={item.href} download>Download {item.title}</a>;
  return <Link className={className} href={item.href}>{item.title}</Link>;
}

export default async function HomePage() {
  const user = await requirePageRole(ANY_ROLE, '/home');
  const home = await loadRoleHome(user);
  return (
    <>
      <PageHeader eyebrow={`${ROLE_LABELS[user.role]} home`} title={`Good to see you, ${user.name.split(' ')[0]}`}>
        {ROLE_DUTIES[user.role]}
      </PageHeader>
      <div className="grid gap-8 md:grid-cols-2">
        {home.sections.map((section) => (
          <section key={section.heading} aria-labelledby={`h-${section.heading}`}>
            <h2 id={`h-${section.heading}`} className="mb-3 text-lg font-semibold">{section.heading}</h2>
            {section.items.length === 0 ? (
              <EmptyState title={section.empty} />
            ) : (
              <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/60">
                {section.items.map((item) => (
                  <li key={item.id} className="flex items-start justify-between gap-3 px-4 py-3">
                    <div>
                      <p className="font-semibold"><ItemTitle item={item} /></p>
                      <p className="text-sm text-ink-soft">{item.detail}</p>
                    </div>
                    <StatusLabel status={item.status} />
                  </li>
                ))}
              </ul>
            )}
          </section>
        ))}
      </div>
    </>
  );
}
