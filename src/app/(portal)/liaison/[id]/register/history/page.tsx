import type { Metadata } from 'next';
import Link from 'next/link';
import { listRegisterHistory } from '@/lib/parcels/list-register-history';
import { EmptyState } from '@/components/ui/empty-state';
import { orNotFound, requireLiaisonPage } from '../../../_components/scheme-page-access';

export const metadata: Metadata = { title: 'Register history' };

const list = (refs: string[]) => (refs.length ? refs.join(', ') : '—');

export default async function RegisterHistoryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { user } = await requireLiaisonPage(id, `/liaison/${id}/register/history`);
  const versions = await orNotFound(() => listRegisterHistory({ user, schemeId: id }));
  if (versions.length === 0) return <EmptyState title="The register has no versions yet." />;
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-2 text-left text-lg font-semibold">History of the parcels register</caption>
      <thead>
        <tr className="border-b border-paper-edge text-left text-ink-soft">
          <th scope="col" className="py-2 pr-3">Version</th>
          <th scope="col" className="py-2 pr-3">When and who</th>
          <th scope="col" className="py-2 pr-3">Source and note</th>
          <th scope="col" className="py-2 pr-3 text-right">Parcels</th>
          <th scope="col" className="py-2 pr-3">Added</th>
          <th scope="col" className="py-2 pr-3">Removed</th>
          <th scope="col" className="py-2">Changed</th>
        </tr>
      </thead>
      <tbody>
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
      </tbody>
    </table>
  );
}
