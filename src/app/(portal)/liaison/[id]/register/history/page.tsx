import type { Metadata } from 'next';
import Link from 'next/link';
import { listRegisterHistory } from '@/lib/parcels/list-register-history';
import { EmptyState } from '@/components/ui/empty-state';
import { orNotFound, requireLiaisonPage } from '../../../_components/scheme-page-access';
import { DataTable } from '@/components/ui/data-table';

export const metadata: Metadata = { title: 'Register history' };

const list = (refs: string[]) => (refs.length ? refs.join(', ') : '—');

export default async function RegisterHistoryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { user } = await requireLiaisonPage(id, `/liaison/${id}/register/history`);
  const versions = await orNotFound(() => listRegisterHistory({ user, schemeId: id }));
  if (versions.length === 0) return <EmptyState title="The register has no versions yet." />;
  return (
    <DataTable caption="History of the parcels register" captionStyle="title" columns={[{ label: 'Version' }, { label: 'When and who' }, { label: 'Source and note' }, { label: 'Parcels', numeric: true }, { label: 'Added' }, { label: 'Removed' }, { label: 'Changed' }]}>
      {versions.map((v) => (
        <tr key={v.id} className="border-b border-paper-edge align-top">
          <th scope="row" className="py-2 pr-3 text-left"><Link className="num text-accent underline" href={`/liaison/${id}/register?version=${v.version}`}>v{v.version}</Link></th>
          <td className="py-2 pr-3"><span className="num">{v.createdAt.replace('T', ' ').slice(0, 16)}</span> UTC<span className="block text-ink-soft">{v.createdBy}</span></td>
          <td className="py-2 pr-3">{v.source}{v.note && v.note !== v.source ? <span className="block text-ink-soft">{v.note}</span> : null}</td>
          <td className="num py-2 pr-3 text-right">{v.parcelCount}</td>
          <td className="num py-2 pr-3">{list(v.changes.added)}</td>
          <td className="num py-2 pr-3">{list(v.changes.removed)}</td>
          <td className="num py-2">{list(v.changes.changed)}</td>
        </tr>
      ))}
    </DataTable>
  );
}
