import type { Metadata } from 'next';
import Link from 'next/link';
import { portalTime } from '@/lib/dates/portal-time';
import { listRegisterHistory } from '@/lib/parcels/list-register-history';
import { EmptyState } from '@/components/ui/empty-state';
import { orNotFound, requireLiaisonPage } from '../../../_components/scheme-page-access';
import { DataTable } from '@/components/ui/data-table';
import { RestoreButton } from './restore-button';

export const metadata: Metadata = { title: 'Register history' };

const list = (refs: string[]) => (refs.length ? refs.join(', ') : '—');

export default async function RegisterHistoryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { user, access } = await requireLiaisonPage(id, `/liaison/${id}/register/history`);
  const versions = await orNotFound(() => listRegisterHistory({ user, schemeId: id }));
  if (versions.length === 0) return <EmptyState title="The register has no versions yet." />;
  const latest = versions.find((v) => v.isLatest)!;
  const columns = [{ label: 'Version' }, { label: 'When and who' }, { label: 'Source and note' }, { label: 'Parcels', numeric: true }, { label: 'Added' }, { label: 'Removed' }, { label: 'Changed, and which fields' }, ...(access === 'manage' ? [{ label: 'Restore' }] : [])];
  return (
    <>
      {access === 'manage' ? <p className="mb-4 text-sm text-ink-soft">Restoring an earlier version saves its parcels as a new version; no version is ever deleted or overwritten.</p> : null}
      <DataTable caption="History of the parcels register" captionStyle="title" columns={columns}>
        {versions.map((v) => (
          <tr key={v.id} className="border-b border-paper-edge align-top" data-testid={`register-version-${v.version}`}>
            <th scope="row" className="py-2 pr-3 text-left"><Link className="num text-accent underline" href={`/liaison/${id}/register?version=${v.version}`}>v{v.version}</Link>{v.isLatest ? <span className="block text-xs text-ink-soft">current</span> : null}</th>
            <td className="py-2 pr-3"><time className="num" dateTime={v.createdAt}>{portalTime(v.createdAt)}</time><span className="block text-ink-soft">{v.createdBy}</span></td>
            <td className="py-2 pr-3">{v.source}{v.note && v.note !== v.source ? <span className="block text-ink-soft">{v.note}</span> : null}</td>
            <td className="num py-2 pr-3 text-right">{v.parcelCount}</td>
            <td className="num py-2 pr-3">{list(v.changes.added)}</td>
            <td className="num py-2 pr-3">{list(v.changes.removed)}</td>
            <td className="py-2 pr-3">
              {v.fieldChanges.length ? (
                <ul>{v.fieldChanges.map((c) => <li key={c.reference}><span className="num">{c.reference}</span>: {c.fields.join(', ')}</li>)}</ul>
              ) : '—'}
            </td>
            {access === 'manage' ? <td className="py-2">{v.isLatest ? <span className="text-ink-faint">current</span> : <RestoreButton schemeId={id} baseRegisterId={latest.id} version={v.version} />}</td> : null}
          </tr>
        ))}
      </DataTable>
    </>
  );
}
