import { toSafeCsv } from '@/lib/csv/to-safe-csv';
import type { EventResult } from '@/lib/hydraulics/case-result';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { unitWords } from './draft-inputs';

/** Columns of the step table, shared by the results page and its CSV download, with their units. */
export function stepTableColumns(units: CaseUnits) {
  const u = unitWords(units);
  return [
    { key: 'distanceUpstream', label: `Distance upstream (${u.length})`, digits: 1 },
    { key: 'bedLevel', label: `Bed level (${u.length})`, digits: 3 },
    { key: 'depth', label: `Depth (${u.length})`, digits: 3 },
    { key: 'waterLevel', label: `Water level (${u.length})`, digits: 3 },
    { key: 'energyLevel', label: `Energy level (${u.length})`, digits: 3 },
    { key: 'velocity', label: `Velocity (${u.velocity})`, digits: 3 },
    { key: 'froude', label: 'Froude number', digits: 3 },
    { key: 'frictionSlope', label: `Friction slope (${u.length}/${u.length})`, digits: 6 },
  ] as const;
}

/**
 * The with-scheme profile of one event as CSV, full precision, one row per computed point. Each row names its event,
 * so a table pasted beside another stays readable; the name is the designer's own text, hence the safe writer.
 */
export function stepTableCsv(event: EventResult, units: CaseUnits): string {
  const columns = stepTableColumns(units);
  return toSafeCsv(['Event', ...columns.map((c) => c.label)], event.profile.map((point) => [event.name, ...columns.map((c) => point[c.key])]));
}
