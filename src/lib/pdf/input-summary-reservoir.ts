import type { CaseInput } from '@/lib/validation/case-schema';
import { dischargeUnit, fixed, lengthUnit, levelText, levelUnit } from './certificate-text';
import { type Doc, fields, heading, paragraph, table } from './pdf-layout';

// The reservoir's inputs as entered, in full, so that a certified routing can be rebuilt from the sheet: the storage
// table row by row and each event's hydrograph point by point (or its published shape and time to peak).

type Units = CaseInput['units'];

function storageTable(doc: Doc, storage: NonNullable<CaseInput['reservoir']>['storage'], units: Units, datum: string | null): void {
  const L = lengthUnit(units);
  if (storage.kind === 'constant-area') {
    fields(doc, [['Storage', `a constant surface area of ${fixed(storage.area, 0)} ${L}² at every level`]]);
    return;
  }
  const area = storage.kind === 'level-area';
  paragraph(doc, area ? 'Storage: surface area by level.' : 'Storage: volume stored by level.');
  const rows = storage.kind === 'level-area' ? storage.rows.map((r) => [fixed(r.level), fixed(r.area, 0)]) : storage.rows.map((r) => [fixed(r.level), fixed(r.volume, 0)]);
  table(doc, [{ title: `Level (${levelUnit(L, datum)})`, width: 1, align: 'right', mono: true }, { title: area ? `Surface area (${L}²)` : `Volume stored (${L}³)`, width: 1, align: 'right', mono: true }], rows.map((cells) => ({ cells })), 7.5);
}

/** Under its heading: the storage, the start level, the reservoir's length and every event's inflow hydrograph. */
export function drawReservoirInputs(doc: Doc, inputs: CaseInput, datum: string | null): void {
  const reservoir = inputs.reservoir;
  if (!reservoir) return;
  const L = lengthUnit(inputs.units);
  heading(doc, 'The reservoir and the inflow hydrographs', 60);
  fields(doc, [
    ['Level at the start of the flood', reservoir.startLevel !== undefined ? levelText(reservoir.startLevel, L, datum) : 'the crest level (the default)'],
    ['Reservoir length along the valley', reservoir.length !== undefined ? `${fixed(reservoir.length, 0)} ${L} upstream of the structure` : 'not given'],
  ]);
  storageTable(doc, reservoir.storage, inputs.units, datum);
  for (const event of inputs.events) {
    const h = event.hydrograph;
    if (!h) {
      fields(doc, [[`Inflow, ${event.name}`, 'none: checked at its steady design discharge']]);
      continue;
    }
    if (h.kind === 'unit-shape') {
      fields(doc, [[`Inflow, ${event.name}`, `the NRCS dimensionless unit hydrograph scaled to the design discharge, time to peak ${fixed(h.timeToPeak, 2)} h`]]);
      continue;
    }
    paragraph(doc, `Inflow hydrograph, ${event.name} (${h.points.length} points):`);
    table(doc, [{ title: 'Time (h)', width: 1, align: 'right', mono: true }, { title: `Inflow (${dischargeUnit(inputs.units)})`, width: 1, align: 'right', mono: true }], h.points.map((p) => ({ cells: [fixed(p.time, 3), fixed(p.discharge, 3)] })), 7.5);
  }
}
