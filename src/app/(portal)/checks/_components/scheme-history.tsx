import type { SchemeHistoryEntry } from '@/lib/review/list-scheme-history';
import { portalTime } from '@/lib/dates/portal-time';
import { DataTable } from '@/components/ui/data-table';

/** The scheme's audit trail: who did what, when, with the hash it concerned and the event's own chained hash. */
export function SchemeHistory({ entries }: { entries: SchemeHistoryEntry[] }) {
  if (entries.length === 0) return <p className="text-sm text-ink-soft">No events yet.</p>;
  return (
    <DataTable caption="History of the scheme" columns={[{ label: 'When' }, { label: 'Who' }, { label: 'What' }, { label: 'Hash' }]}>
      {entries.map((e) => (
        <tr key={e.id} className="border-b border-paper-edge align-top">
          <td className="num whitespace-nowrap py-1 pr-3 text-xs">{portalTime(e.at)}</td>
          <td className="py-1 pr-3">{e.who}</td>
          <td className="py-1 pr-3">{e.action}{e.what ? <span className="text-ink-soft"> · {e.what}</span> : null}</td>
          <td className="num py-1 text-xs text-ink-faint" title={`Event hash ${e.eventHash}`}>{e.hash ? `${e.hash.slice(0, 16)}…` : `event ${e.eventHash.slice(0, 10)}…`}</td>
        </tr>
      ))}
    </DataTable>
  );
}
