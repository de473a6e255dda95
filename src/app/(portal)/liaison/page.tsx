import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageRole } from '@/lib/auth/page-guard';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';
import { listLiaisonSchemes } from '@/lib/parcels/list-liaison-schemes';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { DataTable } from '@/components/ui/data-table';

export const metadata: Metadata = { title: 'Landowners' };

export default async function LiaisonIndexPage() {
  const user = await requirePageRole(LIAISON_READERS, '/liaison');
  const schemes = await listLiaisonSchemes(user);
  return (
    <>
      <PageHeader eyebrow="Landowner liaison" title="Landowners along each scheme">
        The parcels register of each scheme, how the scheme affects each parcel, and the letters sent to their owners. Owner details are personal data: only liaison officers, administrators and a scheme’s own designer and checker see them.
      </PageHeader>
      {schemes.length === 0 ? (
        <EmptyState title="No scheme to show." />
      ) : (
        <DataTable caption="Schemes and their landowner liaison" columns={[{ label: 'Reference' }, { label: 'Scheme' }, { label: 'Parcels register' }, { label: 'Certified revision' }, { label: 'Letters' }]}>
          {schemes.map((s) => (
            <tr key={s.id} className="border-b border-paper-edge">
              <td className="num py-2 pr-4">{s.reference}</td>
              <td className="py-2 pr-4"><Link className="font-semibold text-accent hover:underline" href={`/liaison/${s.id}`}>{s.name}</Link><span className="block text-ink-soft">{s.watercourse} at {s.site}</span></td>
              <td className="py-2 pr-4">{s.register ? <>version <span className="num">{s.register.version}</span>, <span className="num">{s.register.parcels}</span> parcels</> : 'none yet'}</td>
              <td className="py-2 pr-4">{s.certifiedRevision ? <span className="num">rev. {s.certifiedRevision}</span> : 'none yet'}</td>
              <td className="py-2">{s.letters.total ? <><span className="num">{s.letters.total}</span> made{s.letters.waiting ? <>, <span className="num">{s.letters.waiting}</span> waiting</> : null}</> : 'none'}</td>
            </tr>
          ))}
        </DataTable>
      )}
    </>
  );
}
