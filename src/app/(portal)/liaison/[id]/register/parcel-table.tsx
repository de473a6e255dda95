import type { ParcelRecord } from '@/lib/parcels/parcel-record';
import { ScrollRegion } from '@/components/ui/scroll-region';

/** The register read-only, for those who may see owner details but not change them, and for earlier versions. */
export function ParcelTable({ parcels }: { parcels: ParcelRecord[] }) {
  return (
    <ScrollRegion label="Parcels register">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Parcels register</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            <th scope="col" className="py-2 pr-3">Parcel</th>
            <th scope="col" className="py-2 pr-3">Owner or occupier</th>
            <th scope="col" className="py-2 pr-3">Postal address</th>
            <th scope="col" className="py-2 pr-3">E-mail</th>
            <th scope="col" className="py-2 pr-3 text-right">From (m)</th>
            <th scope="col" className="py-2 pr-3 text-right">To (m)</th>
            <th scope="col" className="py-2 pr-3">Bank</th>
            <th scope="col" className="py-2 pr-3 text-right">Ground level (m)</th>
            <th scope="col" className="py-2">Land use</th>
          </tr>
        </thead>
        <tbody>
          {parcels.map((p) => (
            <tr key={p.id} className="border-b border-paper-edge align-top">
              <th scope="row" className="num py-2 pr-3 text-left font-semibold">{p.reference}</th>
              <td className="py-2 pr-3">{p.ownerName}</td>
              <td className="py-2 pr-3">{p.postalAddress}</td>
              <td className="py-2 pr-3">{p.email ?? <span className="text-ink-faint">none: by post</span>}</td>
              <td className="num py-2 pr-3 text-right">{p.distanceFromM.toFixed(0)} m</td>
              <td className="num py-2 pr-3 text-right">{p.distanceToM.toFixed(0)} m</td>
              <td className="py-2 pr-3">{p.bankSide}</td>
              <td className="num py-2 pr-3 text-right">{p.groundLevelM === null ? <span className="text-ink-faint">bank level</span> : `${p.groundLevelM.toFixed(2)} m`}</td>
              <td className="py-2">{p.landUse ?? ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
