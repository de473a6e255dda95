import type { ParcelImpactTable } from '@/lib/parcels/compute-parcel-impact';
import { distance, metres } from '@/lib/parcels/format-quantity';
import { CategoryLabel } from '../../_components/category-label';
import { ParcelStripSvg } from '../../_components/parcel-strip-svg';
import { ScrollRegion } from '@/components/ui/scroll-region';

type Flooding = ParcelImpactTable['rows'][number]['events'][number]['withScheme'];
const wet = (f: Flooding) => (f === null ? 'not known' : f.inundatedLength === 0 ? 'dry' : `${distance(f.inundatedLength)}, ${metres(f.maxDepth)} deep`);

/** One row per parcel: its frontage, then for every event the greatest rise and how much is under water without and with the scheme. */
export function ImpactTable({ table }: { table: ParcelImpactTable }) {
  return (
    <ScrollRegion label="Impact on each parcel" className="mt-3">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Impact of the scheme on each parcel, every flood event</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            <th scope="col" className="py-2 pr-3">Parcel and owner</th>
            <th scope="col" className="py-2 pr-3">Frontage</th>
            {table.events.map((e) => <th key={e.name} scope="col" className="min-w-[12rem] py-2 pr-3">{e.name}: rise (ends) · under water without → with</th>)}
            <th scope="col" className="py-2 pr-3">Category</th>
            <th scope="col" className="py-2">Long-section</th>
          </tr>
        </thead>
        <tbody>
          {table.rows.map((row) => (
            <tr key={row.parcel.id} className="border-b border-paper-edge align-top" data-testid={`impact-${row.parcel.reference}`} data-category={row.category}>
              <th scope="row" className="min-w-[9rem] py-2 pr-3 text-left font-normal"><span className="num font-semibold">{row.parcel.reference}</span><span className="block text-ink-soft">{row.parcel.ownerName}</span></th>
              <td className="num py-2 pr-3 whitespace-nowrap">{distance(row.parcel.distanceFromM)} – {distance(row.parcel.distanceToM)}<span className="block font-sans text-ink-soft">{row.parcel.bankSide === 'both' ? 'both banks' : `${row.parcel.bankSide} bank`}{row.parcel.landUse ? `, ${row.parcel.landUse}` : ''}</span></td>
              {row.events.map((e) => (
                <td key={e.event} className="py-2 pr-3">
                  {e.assessed === null ? <span className="text-ink-faint">beyond the reach</span> : (
                    <>
                      <span className="num whitespace-nowrap font-semibold">{metres(e.maxAfflux, 3)}</span> <span className="num whitespace-nowrap text-ink-soft">({metres(e.affluxAtFrom, 3)} / {metres(e.affluxAtTo, 3)})</span>
                      <span className="block text-ink-soft">{wet(e.withoutScheme)} → {wet(e.withScheme)}</span>
                      {e.assessed.to < row.parcel.distanceToM ? <span className="block text-xs text-verdict-caution">assessed to {distance(e.assessed.to)} only</span> : null}
                    </>
                  )}
                </td>
              ))}
              <td className="py-2 pr-3"><CategoryLabel category={row.category} /></td>
              <td className="py-2">{row.strip ? <ParcelStripSvg strip={row.strip} reference={row.parcel.reference} /> : <span className="text-ink-faint">—</span>}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
