import { caseFieldName } from '@/lib/case-words/describe-case-field';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CaseInput } from '@/lib/validation/case-schema';
import { datumName, fixed, heightText, lengthUnit, levelText, slopeText, withUnit } from './certificate-text';
import { bedLevelAtStructure } from './input-summary-structure';
import type { FieldRow } from './pdf-layout';

type Prismatic = Extract<CaseInput['reach'], { kind: 'prismatic' }>;
type Surveyed = Extract<CaseInput['reach'], { kind: 'surveyed' }>;

function sideSlopes(s: { sideSlope?: number; sideSlopeLeft?: number; sideSlopeRight?: number }): string {
  const left = s.sideSlopeLeft ?? s.sideSlope;
  const right = s.sideSlopeRight ?? s.sideSlope;
  return left === right ? `side slopes ${left}:1 (horizontal:vertical)` : `side slopes ${left}:1 left, ${right}:1 right (horizontal:vertical)`;
}

function sectionWords(section: Prismatic['section'], L: string): string {
  switch (section.shape) {
    case 'rectangular':
      return `rectangular, width ${withUnit(section.width, L)}`;
    case 'trapezoidal':
      return `trapezoidal, bottom width ${withUnit(section.bottomWidth, L)}, ${sideSlopes(section)}`;
    case 'triangular':
      return `triangular, ${sideSlopes(section)}`;
    case 'circular':
      return `circular, diameter ${withUnit(section.diameter, L)}`;
  }
}

function prismaticRows(reach: Prismatic, L: string, datum: string | null): FieldRow[] {
  return [
    ['Channel', `Prismatic, one cross-section along the reach: ${sectionWords(reach.section, L)}`],
    [caseFieldName('reach.manningN'), String(reach.manningN)],
    [caseFieldName('reach.bedSlope'), slopeText(reach.bedSlope)],
    [caseFieldName('reach.length'), withUnit(reach.length, L, 0)],
    [caseFieldName('reach.bedLevelAtControl'), levelText(reach.bedLevelAtControl, L, datum)],
    ['Bank height', reach.bankHeight !== undefined ? heightText(reach.bankHeight, L) : 'not given (inundation not checked)'],
  ];
}

function range(values: number[], digits: number, unit = ''): string {
  const low = Math.min(...values);
  const high = Math.max(...values);
  const suffix = unit ? ` ${unit}` : '';
  return low === high ? `${fixed(low, digits)}${suffix}` : `${fixed(low, digits)} to ${fixed(high, digits)}${suffix}`;
}

function surveyedRows(reach: Surveyed, inputs: CaseInput, results: CaseResult, L: string, datum: string | null): FieldRow[] {
  const distances = reach.sections.map((s) => s.distanceUpstream);
  const spacings = distances.slice(1).map((d, i) => d - distances[i]);
  const roughness = reach.sections.flatMap((s) => (typeof s.manningN === 'number' ? [s.manningN] : [s.manningN.left, s.manningN.channel, s.manningN.right]));
  const split = reach.sections.some((s) => typeof s.manningN !== 'number');
  const banks = reach.sections.filter((s) => s.bankLevel !== undefined || s.bankStations !== undefined).length;
  const meanSlope = results.events[0]?.bedSlope;
  return [
    ['Channel', `Surveyed reach of ${reach.sections.length} cross-sections, from the structure to ${withUnit(distances[distances.length - 1], L, 0)} upstream`],
    ['Spacing of the sections', `${range(spacings, 0, L)} (mean ${fixed(distances[distances.length - 1] / spacings.length, 0)} ${L})`],
    ["Manning's n", `${range(roughness, 3)}${split ? ' (left bank, channel and right bank given separately on some sections)' : ''}`],
    ['Bed slope', meanSlope === undefined ? 'not computed' : `${slopeText(meanSlope)}, mean over the survey`],
    ['Reach length', withUnit(distances[distances.length - 1], L, 0)],
    [caseFieldName('reach.bedLevelAtControl'), levelText(bedLevelAtStructure(inputs, results), L, datum)],
    ['Bank levels', banks > 0 ? `given or marked on ${banks} of ${reach.sections.length} sections` : 'not given (inundation not checked)'],
  ];
}

/** The channel the check rests on: its section or a summary of the survey, roughness, slope, length and datum. */
export function channelRows(inputs: CaseInput, results: CaseResult, datum: string | null): FieldRow[] {
  const L = lengthUnit(results.units);
  const reach = inputs.reach;
  const rows = reach.kind === 'prismatic' ? prismaticRows(reach, L, datum) : surveyedRows(reach, inputs, results, L, datum);
  rows.push([caseFieldName('reach.energyCoefficient'), reach.energyCoefficient !== undefined ? String(reach.energyCoefficient) : '1 (default)']);
  rows.push(['Level datum', `every level on this sheet is in ${L} above ${datumName(datum)}; depths and heights are above the bed`]);
  return rows;
}
