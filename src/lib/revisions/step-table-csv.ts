import { type CsvCell, toSafeCsv } from '@/lib/csv/to-safe-csv';
import type { EventResult } from '@/lib/hydraulics/case-result';
import { affluxAlong } from '@/lib/hydraulics/impact/afflux';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { unitWords } from './draft-inputs';

/** Columns of the step table on the results page, with their units and the digits shown. */
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

export interface StepTableCsvOptions {
  scheme: { reference: string; name: string };
  revisionNumber: number;
  datum: string | null;
  event: EventResult;
  units: CaseUnits;
  engineVersion: string;
}

// Rounded as the trade reads them: levels and depths to the millimetre (or thousandth of a foot), distances to the
// decimetre, the friction slope to four significant figures. Written as numbers, so a negative level stays a number.
const fixed = (x: number, digits: number) => Number(x.toFixed(digits));
const significant = (x: number, digits: number) => Number(x.toPrecision(digits));

/**
 * The with-scheme profile of one event as CSV: a header block saying what the table is, then one row per computed
 * point with the level without the scheme and the afflux beside the level with it. Each row names its event, so a
 * table pasted beside another stays readable; the names are the designer's own text, hence the formula-safe writer.
 */
export function stepTableCsv({ scheme, revisionNumber, datum, event, units, engineVersion }: StepTableCsvOptions): string {
  const u = unitWords(units);
  const level = `${u.length} above ${datum ?? 'the datum'}`;
  const block: CsvCell[][] = [
    ['Scheme', `${scheme.reference} ${scheme.name}`],
    ['Revision', revisionNumber],
    ['Event', event.name],
    ['Design discharge', fixed(event.discharge, 3), u.discharge],
    ['Units', units === 'US' ? 'US customary: lengths in ft, discharges in ft³/s' : 'SI: lengths in m, discharges in m³/s'],
    ['Level datum', datum ?? 'not given'],
    ['Levels', `in ${level}; depths above the bed`],
    ['Engine version', engineVersion],
    [],
  ];
  const afflux = affluxAlong(event.profile, event.withoutScheme.profile);
  const rows: CsvCell[][] = [];
  event.profile.forEach((p, i) => {
    const row = [event.name, fixed(p.distanceUpstream, 1), fixed(p.bedLevel, 3), fixed(p.depth, 3), fixed(p.waterLevel, 3), fixed(p.waterLevel - afflux[i].afflux, 3), fixed(afflux[i].afflux, 3), fixed(p.energyLevel, 3), fixed(p.velocity, 3), fixed(p.froude, 3), significant(p.frictionSlope, 4)];
    // Two points closer than the rounding would print the same row twice.
    const previous = rows.at(-1);
    if (!previous || previous.some((cell, j) => cell !== row[j])) rows.push(row);
  });
  const header = ['Event', `Distance upstream (${u.length})`, `Bed level (${level})`, `Depth (${u.length})`, `Water level with the scheme (${level})`, `Water level without the scheme (${level})`, `Afflux (${u.length})`, `Energy level (${level})`, `Velocity (${u.velocity})`, 'Froude number', `Friction slope (${u.length}/${u.length})`];
  return toSafeCsv(['Step table', 'the with-scheme profile point by point'], [...block, header, ...rows]);
}

/** The afflux at each point of the with-scheme profile, for the page's table; none (shown as dashes) if the stored without-scheme profile falls short. */
export function stepTableAfflux(event: EventResult): number[] {
  try {
    return affluxAlong(event.profile, event.withoutScheme.profile).map((a) => a.afflux);
  } catch {
    return [];
  }
}
