import type { ParcelCategory } from '@/lib/hydraulics/impact/parcel-impact';
import { type CsvCell, toSafeCsv } from '@/lib/csv/to-safe-csv';
import type { ParcelImpactTable } from './compute-parcel-impact';
import type { ParcelRecord } from './parcel-record';

// The liaison officer's spreadsheets: the register, the impact table (one row per parcel and flood event) and the
// tracking list. Pure; every text cell goes through toSafeCsv, so a name like "=cmd" opens as text.

const CATEGORY: Record<ParcelCategory, string> = { affected: 'Affected', 'below-threshold': 'Affected below the threshold', 'not-affected': 'Not affected', 'outside-reach': 'Beyond the computed reach' };
const BANK: Record<string, string> = { left: 'left bank', right: 'right bank', both: 'both banks' };
const round = (value: number | null | undefined, places: number) => (value === null || value === undefined ? null : Number(value.toFixed(places)));

export function registerCsv(parcels: ParcelRecord[]): string {
  return toSafeCsv(
    ['Parcel', 'Owner', 'Postal address', 'E-mail', 'From (m upstream)', 'To (m upstream)', 'Bank', 'Lowest ground level (m above datum)', 'Land use'],
    parcels.map((p) => [p.reference, p.ownerName, p.postalAddress, p.email, p.distanceFromM, p.distanceToM, BANK[p.bankSide] ?? p.bankSide, p.groundLevelM, p.landUse]),
  );
}

export function impactCsv(table: ParcelImpactTable): string {
  const flows = new Map(table.events.map((e) => [e.name, e.dischargeM3s]));
  const rows: CsvCell[][] = table.rows.flatMap((row) =>
    row.events.map((e) => [
      row.parcel.reference,
      e.event,
      round(flows.get(e.event), 3),
      CATEGORY[e.category],
      round(e.maxAfflux, 3),
      round(e.maxAffluxAt, 1),
      round(e.withoutScheme?.inundatedLength, 1),
      round(e.withScheme?.inundatedLength, 1),
      round(e.withScheme?.maxDepth, 3),
    ]),
  );
  return toSafeCsv(['Parcel', 'Flood event', 'River flow (m³/s)', 'Impact', 'Greatest rise in level (m)', 'Where greatest (m upstream)', 'Frontage under water without the scheme (m)', 'Frontage under water with the scheme (m)', 'Greatest depth on the land with the scheme (m)'], rows);
}

export interface TrackingRow {
  parcelReference: string;
  ownerName: string;
  letterVersion: number;
  revisionNumber: number;
  status: string;
  sentOn: string | null;
  dueOn: string | null;
  responses: { receivedOn: string; type: string; channel: string; summary: string }[];
}

export function trackingCsv(rows: TrackingRow[]): string {
  return toSafeCsv(
    ['Parcel', 'Owner', 'Letter version', 'From revision', 'Status', 'Sent or posted on', 'Response due', 'Responses', 'Latest response received', 'Latest response kind', 'Latest response by', 'Latest response'],
    rows.map((r) => {
      const latest = r.responses[0];
      return [r.parcelReference, r.ownerName, r.letterVersion, r.revisionNumber, r.status, r.sentOn, r.dueOn, r.responses.length, latest?.receivedOn, latest?.type, latest?.channel, latest?.summary];
    }),
  );
}
