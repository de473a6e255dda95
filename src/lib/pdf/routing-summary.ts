import type { RoutingResult } from '@/lib/hydraulics/routing/routing-result';
import { areaUnit, durationWords, fixedWithoutNegativeZero, hoursOf, volumeUnit } from '@/lib/routing-sheet/event-routing';
import { fixed, levelText, levelUnit } from './certificate-text';
import type { FieldRow } from './pdf-layout';

const STORAGE_KINDS = { 'level-area': 'table of surface area by level', 'level-volume': 'table of stored volume by level', 'constant-area': 'constant surface area' } as const;

interface Units { length: string; discharge: string }

/** The inflow and the storage that were routed, as the sheets summarise them. */
export function routingInputRows(r: RoutingResult, u: Units, datum: string | null): FieldRow[] {
  const h = r.hydrograph;
  const s = r.storage;
  const inflow = h.kind === 'table' ? `${h.points} points entered by the designer` : `shaped from the design discharge, time to peak ${durationWords(h.timeToPeak)}, by ${h.shapeSource ?? 'a published dimensionless hydrograph'} (${h.points} points)`;
  const range = s.lowestLevel !== null && s.highestLevel !== null ? `, ${s.rows} rows from ${fixed(s.lowestLevel)} to ${fixed(s.highestLevel)} ${levelUnit(u.length, datum)}` : '';
  return [
    ['Inflow hydrograph', `${inflow}; peak ${fixed(h.peakInflow)} ${u.discharge} at ${fixed(hoursOf(h.timeToPeak), 2)} h; duration ${fixed(hoursOf(h.duration), 2)} h; volume ${fixed(h.volume, 0)} ${volumeUnit(u.length)}`],
    ['Reservoir storage', `${STORAGE_KINDS[s.kind]}${range}; surface area at the start level ${fixed(s.areaAtStart, 0)} ${areaUnit(u.length)}`],
    ['Level at the start of the flood', levelText(s.startLevel, u.length, datum)],
    ['Reservoir length along the valley', s.reservoirLength !== null ? `${fixed(s.reservoirLength, 0)} ${u.length} upstream of the structure: limits within it are checked against the peak reservoir level` : 'not given: every limit is checked against the profile upstream'],
    ['Routing method', r.methodSource],
  ];
}

/** The routing's outcome: peaks, attenuation and lag, the volume balance and how far the numbers were checked. */
export function routingPeakRows(r: RoutingResult, u: Units, datum: string | null): FieldRow[] {
  const b = r.volumeBalance;
  const v = volumeUnit(u.length);
  const check = r.selfCheck;
  return [
    ['Peak inflow', `${fixed(r.inflowPeak.discharge)} ${u.discharge} at ${fixed(hoursOf(r.inflowPeak.time), 2)} h`],
    ['Peak outflow', `${fixed(r.outflowPeak.discharge)} ${u.discharge} at ${fixed(hoursOf(r.outflowPeak.time), 2)} h`],
    ['Attenuation and lag', `${fixed(r.attenuation)} ${u.discharge} lower, ${durationWords(r.lag)} later`],
    ['Peak reservoir level', `${levelText(r.peakLevel.level, u.length, datum)} at ${fixed(hoursOf(r.peakLevel.time), 2)} h`],
    ['Volume balance', `inflow ${fixed(b.inflow, 0)} ${v}, outflow ${fixed(b.outflow, 0)} ${v}, change in storage ${fixed(b.storageChange, 0)} ${v}; left over ${fixedWithoutNegativeZero(b.residual, 1)} ${v}`],
    ['Time step', `${durationWords(r.refinement.timeStep)} after ${r.refinement.halvings} halvings; last change in peak level ${fixed(r.refinement.peakLevelChangeOnHalving, 4)} ${u.length} (tolerance ${fixed(r.refinement.tolerance, 4)} ${u.length})${r.refinement.converged ? '' : ', NOT settled'}`],
    ['Independent check', check ? `${check.method}: peak level differs by ${fixed(check.peakLevelDifference, 4)} ${u.length}, peak outflow by ${fixed(check.peakOutflowDifference, 3)} ${u.discharge}` : 'not run for this event'],
  ];
}
