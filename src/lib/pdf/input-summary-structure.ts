import { caseFieldName } from '@/lib/case-words/describe-case-field';
import { valueInWords } from '@/lib/case-words/value-words';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { coefficientWords } from '@/lib/hydraulics/weirs/coefficient-words';
import type { CaseInput } from '@/lib/validation/case-schema';
import { dischargeUnit, fixed, heightText, lengthUnit, levelText, withUnit } from './certificate-text';
import type { FieldRow } from './pdf-layout';

const CASE_PIER_COEFFICIENT = caseFieldName('control.piers.coefficient').toLowerCase();

type WeirControl = Extract<CaseInput['control'], { type: 'weir' }>;

const KIND_WORDS: Record<WeirControl['kind'], string> = {
  'sharp-crested': 'Sharp-crested (thin-plate) weir',
  'broad-crested': 'Broad-crested weir',
  ogee: 'Ogee spillway',
  'rating-table': 'Structure rated by a table of level against discharge',
};

/** Bed level at the structure as the engine used it: the first point of the profile, else the prismatic input. */
export function bedLevelAtStructure(inputs: CaseInput, results: CaseResult): number | null {
  const fromProfile = results.events[0]?.profile[0]?.bedLevel;
  if (fromProfile !== undefined) return fromProfile;
  return inputs.reach.kind === 'prismatic' ? inputs.reach.bedLevelAtControl : null;
}

function coefficientRows(control: WeirControl, results: CaseResult): FieldRow[] {
  const rows: FieldRow[] = [];
  if (control.coefficient !== undefined) {
    rows.push([`${caseFieldName('control.coefficient')} given by the designer`, `${control.coefficient}${control.coefficientReason ? ` (${control.coefficientReason})` : ''}`]);
  }
  for (const event of results.events) {
    const weir = event.control.weir;
    if (!weir) continue;
    rows.push([`Coefficient, ${event.name}`, `${coefficientWords(weir.coefficient, weir.coefficientForm)}; ${weir.coefficientIsDefault ? 'published value' : "designer's value"}: ${weir.coefficientSource}`]);
  }
  return rows;
}

function tailwaterRow(control: WeirControl, bedLevel: number | null, L: string, datum: string | null): FieldRow {
  const given = control.tailwaterDepth ?? control.tailwaterLevel;
  if (given === undefined) return ['Tailwater', 'none given: the structure is rated against the level the channel holds downstream without the scheme'];
  const level = bedLevel === null ? '' : ` (level ${levelText(bedLevel + given, L, datum)})`;
  return ['Tailwater', `${heightText(given, L)} just downstream of the structure${level}`];
}

function weirRows(control: WeirControl, inputs: CaseInput, results: CaseResult, datum: string | null): FieldRow[] {
  const L = lengthUnit(results.units);
  const bedLevel = bedLevelAtStructure(inputs, results);
  const rows: FieldRow[] = [['Type', KIND_WORDS[control.kind]]];
  rows.push(['Crest level', bedLevel === null ? 'not known (no bed level at the structure)' : levelText(bedLevel + control.sillHeight, L, datum)]);
  rows.push(['Sill height', heightText(control.sillHeight, L)]);
  if (control.crestLength !== undefined) rows.push([caseFieldName('control.crestLength'), withUnit(control.crestLength, L)]);
  if (control.crestBreadth !== undefined) rows.push([caseFieldName('control.crestBreadth'), withUnit(control.crestBreadth, L)]);
  if (control.noseShape !== undefined) rows.push([caseFieldName('control.noseShape'), valueInWords(control.noseShape)]);
  if (control.channelWidth !== undefined) rows.push([caseFieldName('control.channelWidth'), withUnit(control.channelWidth, L)]);
  if (control.designHead !== undefined) rows.push([caseFieldName('control.designHead'), withUnit(control.designHead, L)]);
  if (control.piers) rows.push([caseFieldName('control.piers'), `${control.piers.count}${control.piers.coefficient !== undefined ? `, ${CASE_PIER_COEFFICIENT} ${control.piers.coefficient}` : ''}`]);
  if (control.abutmentCoefficient !== undefined) rows.push([caseFieldName('control.abutmentCoefficient'), String(control.abutmentCoefficient)]);
  if (control.ratingTable) {
    const first = control.ratingTable[0];
    const last = control.ratingTable[control.ratingTable.length - 1];
    rows.push([caseFieldName('control.ratingTable'), `${control.ratingTable.length} rows, from ${withUnit(first[1], dischargeUnit(results.units), 2)} at ${withUnit(first[0], L)} to ${withUnit(last[1], dischargeUnit(results.units), 2)} at ${withUnit(last[0], L)} above the crest`]);
  }
  rows.push(...coefficientRows(control, results));
  rows.push(['Approach velocity', control.approachVelocity === false ? 'ignored: the head is the water level above the crest' : 'included: the head is the energy head above the crest (water level plus the velocity head of the approach flow)']);
  rows.push(tailwaterRow(control, bedLevel, L, datum));
  return rows;
}

/** What the scheme builds, from the frozen inputs and the coefficients the engine used. */
export function structureRows(inputs: CaseInput, results: CaseResult, datum: string | null): FieldRow[] {
  const L = lengthUnit(results.units);
  const rows: FieldRow[] =
    inputs.control.type === 'weir'
      ? weirRows(inputs.control, inputs, results, datum)
      : [['Type', 'A given depth at the control section (no crest is modelled)'], ['Depth held at the control', heightText(inputs.control.depth, L)]];
  const without = results.events[0]?.withoutScheme;
  rows.push([
    'Without the scheme',
    inputs.existingControl ? `the existing control holds ${heightText(inputs.existingControl.depth, L)}` : `normal depth at the control${without ? ` (${fixed(without.controlDepth)} ${L} deep in ${results.events[0].name})` : ''}`,
  ]);
  return rows;
}
