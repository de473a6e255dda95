import Link from 'next/link';
import type { TrackedLetter } from '@/lib/letters/list-letter-tracking';
import { LetterStatusLabel } from '../../_components/letter-status-label';
import { DataTable } from '@/components/ui/data-table';
import { LocalTime } from '@/components/ui/local-time';


/** Per parcel, which letter version went to whom and when, and whether the owner answered. */
export function TrackingTable({ schemeId, parcels }: { schemeId: string; parcels: { reference: string; ownerName: string; letters: TrackedLetter[] }[] }) {
  if (parcels.length === 0) return <p className="text-sm text-ink-soft">No letters yet.</p>;
  return (
    <DataTable caption="Letters by parcel" columns={[{ label: 'Parcel' }, { label: 'Letter' }, { label: 'To' }, { label: 'Status' }, { label: 'Sent or posted' }, { label: 'Response due' }, { label: 'Responses' }]}>
      {parcels.flatMap((p) =>
        p.letters.map((l, i) => (
          <tr key={l.id} className="border-b border-paper-edge align-top">
            {i === 0 ? <th scope="rowgroup" rowSpan={p.letters.length} className="py-2 pr-3 text-left font-normal"><span className="num font-semibold">{p.reference}</span><span className="block text-ink-soft">{p.ownerName}</span></th> : null}
            <td className="py-2 pr-3"><Link className="text-accent underline" href={`/liaison/${schemeId}/letters/${l.id}`}>Version <span className="num">{l.version}</span>, revision <span className="num">{l.revisionNumber}</span></Link>{l.preliminary ? <span className="ml-1 text-xs font-semibold text-verdict-caution">PRELIMINARY</span> : null}</td>
            <td className="py-2 pr-3">{l.recipient}</td>
            <td className="py-2 pr-3"><LetterStatusLabel status={l.status} />{l.failureReason ? <span className="block text-xs text-verdict-fail">{l.failureReason}</span> : null}</td>
            <td className="py-2 pr-3">{l.postedOn ? <span className="num">{l.postedOn} (posted)</span> : <LocalTime iso={l.sentAt} />}</td>
            <td className="num py-2 pr-3">{l.responseDueOn ?? '—'}</td>
            <td className="num py-2">{l.responses}</td>
          </tr>
        )),
      )}
    </DataTable>
  );
}
