import type { Metadata } from 'next';
import Link from 'next/link';
import { ImportCaseForm } from '@/components/forms/import-case-form';
import { EmptyState } from '@/components/ui/empty-state';
import { buttonClassName } from '@/components/ui/form-field';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listSchemes } from '@/lib/schemes/list-schemes';
import { DataTable } from '@/components/ui/data-table';

export const metadata: Metadata = { title: 'Schemes' };

export default async function SchemesPage() {
  const user = await requirePageRole(ANY_ROLE, '/schemes');
  const schemes = await listSchemes(user);
  return (
    <>
      <PageHeader eyebrow="Register" title="Schemes">{user.role === 'planning' ? 'Schemes with a certificate.' : 'Weir and spillway schemes you can see.'}</PageHeader>
      {user.role === 'designer' ? (
        <div className="mb-8 grid gap-4 md:grid-cols-[auto_1fr] md:items-start">
          <Link href="/schemes/new" className={buttonClassName}>+ New scheme</Link>
          <ImportCaseForm />
        </div>
      ) : null}
      {schemes.length === 0 ? (
        <EmptyState title="No schemes to show yet." />
      ) : (
        <DataTable caption="Schemes" columns={[{ label: 'Reference' }, { label: 'Scheme' }, { label: 'Watercourse and site' }, { label: 'Latest revision' }]}>
          {schemes.map((s) => (
            <tr key={s.id} className="border-b border-paper-edge">
              <td className="num py-2 pr-4">{s.reference}</td>
              <td className="py-2 pr-4 font-semibold"><Link className="text-accent underline" href={`/schemes/${s.id}`}>{s.name}</Link></td>
              <td className="py-2 pr-4">{s.watercourse} at {s.site}</td>
              <td className="py-2">{s.latestRevision ? <span className="flex items-center gap-2"><span className="num">rev. {s.latestRevision.number}</span><StatusLabel status={s.latestRevision.status} /></span> : '—'}</td>
            </tr>
          ))}
        </DataTable>
      )}
    </>
  );
}
