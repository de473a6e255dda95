import { caseFieldName } from '@/lib/case-words/describe-case-field';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CaseInput } from '@/lib/validation/case-schema';
import { dischargeUnit, fixed, lengthUnit, levelUnit, percent, withUnit } from './certificate-text';
import { channelRows } from './input-summary-channel';
import { structureRows } from './input-summary-structure';
import { type Doc, type FieldRow, fields, heading, table } from './pdf-layout';
import { drawReservoirInputs } from './input-summary-reservoir';

// Every input of the check, in one place for the certificate and the calculation sheet alike, so that a reader of
// either can rebuild the check from the page.

export interface InputSummarySource {
  inputs: CaseInput;
  results: CaseResult;
  datum: string | null;
}

function eventsTable(doc: Doc, { inputs, results }: InputSummarySource): void {
  const Q = dischargeUnit(results.units);
  table(
    doc,
    [
      { title: 'Design event', width: 80 },
      { title: `${caseFieldName('events[].discharge')} (${Q})`, width: 60, align: 'right', mono: true },
      { title: 'Annual exceedance probability', width: 70, align: 'right', mono: true },
      { title: caseFieldName('events[].returnPeriod'), width: 60, align: 'right', mono: true },
      { title: caseFieldName('events[].climateChangeAllowance'), width: 64, align: 'right', mono: true },
      { title: `Design discharge (${Q})`, width: 64, align: 'right', mono: true },
    ],
    inputs.events.map((e, i) => ({
      cells: [
        e.name,
        fixed(e.discharge, 2),
        e.annualExceedanceProbability !== undefined ? percent(e.annualExceedanceProbability * 100, 2) : 'not given',
        e.returnPeriod !== undefined ? `${e.returnPeriod} years` : 'not given',
        e.climateChangeAllowance ? `+${percent(e.climateChangeAllowance)}` : 'none',
        fixed(results.events[i]?.discharge, 2),
      ],
    })),
  );
}

function limitsTable(doc: Doc, { inputs, results, datum }: InputSummarySource): void {
  const L = lengthUnit(results.units);
  if (inputs.limits.length === 0) {
    fields(doc, [['Flood-level limits', 'none given: the check reports the afflux and its extent only']]);
    return;
  }
  table(
    doc,
    [
      { title: 'Flood-level limit', width: 150 },
      { title: `${caseFieldName('limits[].distanceUpstream')} (${L})`, width: 54, align: 'right', mono: true },
      { title: `${caseFieldName('limits[].maxLevel')} (${levelUnit(L, datum)})`, width: 80, align: 'right', mono: true },
      { title: `${caseFieldName('limits[].freeboard')} (${L})`, width: 54, align: 'right', mono: true },
      { title: `Water to stay below (${levelUnit(L, datum)})`, width: 80, align: 'right', mono: true },
    ],
    inputs.limits.map((l) => ({ cells: [l.label, fixed(l.distanceUpstream, 0), fixed(l.maxLevel), fixed(l.freeboard), fixed(l.maxLevel - l.freeboard)] })),
  );
}

function methodRows({ inputs, results }: InputSummarySource): FieldRow[] {
  const L = lengthUnit(results.units);
  const p = inputs.profile;
  const method = p.method ?? (inputs.reach.kind === 'prismatic' ? 'direct-step' : 'standard-step');
  const rows: FieldRow[] = [
    ['Step method', `${method === 'direct-step' ? 'direct step' : 'standard step'}${p.method === undefined ? ' (the default for this reach)' : ''}`],
    ['Profile ends', `where the depth is within ${percent(p.normalDepthTolerance * 100, 2)} of normal depth, or at the end of the reach`],
  ];
  if (p.frictionSlopeAveraging) rows.push(['Friction slope between sections', p.frictionSlopeAveraging.replace('-', ' ')]);
  if (p.expansionCoefficient !== undefined || p.contractionCoefficient !== undefined) {
    rows.push(['Expansion and contraction coefficients', `${p.expansionCoefficient ?? 'default'} and ${p.contractionCoefficient ?? 'default'}`]);
  }
  rows.push([caseFieldName('impactThreshold'), inputs.impactThreshold !== undefined ? withUnit(inputs.impactThreshold, L) : `${results.units === 'US' ? '0.033 ft' : '0.010 m'} (default)`]);
  rows.push([caseFieldName('minimumMargin'), inputs.minimumMargin !== undefined ? withUnit(inputs.minimumMargin, L) : `0 ${L} (none asked for)`]);
  for (const e of results.events) {
    const r = e.refinement;
    rows.push([`Step refinement, ${e.name}`, `${r.stepsUsed} steps; the extent changed by ${percent(Math.abs(r.extentChangeOnHalving) * 100, 2)} on the last halving of the step; ${r.converged ? 'converged' : 'NOT converged'}`]);
    const s = e.selfCheck;
    rows.push([`Self-check, ${e.name}`, s ? `${s.method}: levels differ by at most ${fixed(s.maxLevelDifference * (results.units === 'US' ? 12 : 1000), 1)} ${results.units === 'US' ? 'in' : 'mm'}, extent by ${percent(Math.abs(s.extentDifference) * 100, 2)}` : 'not run for this profile']);
  }
  if (inputs.sizing) {
    const z = inputs.sizing;
    rows.push(['Crest sizing asked for', `${z.vary === 'sillHeight' ? 'sill height' : 'crest length'} in steps of ${withUnit(z.increment, L)}${z.min !== undefined ? ` from ${withUnit(z.min, L)}` : ''}${z.max !== undefined ? ` to ${withUnit(z.max, L)}` : ''}${z.robust ? ', every sensitivity run to pass' : ''}`]);
  }
  rows.push(['Engine version', results.engineVersion, true]);
  return rows;
}

/** The inputs under their own headings: structure, channel, design floods, limits and the method's settings. */
export function drawInputSummary(doc: Doc, source: InputSummarySource): void {
  heading(doc, 'The structure');
  fields(doc, structureRows(source.inputs, source.results, source.datum));
  heading(doc, 'The channel');
  fields(doc, channelRows(source.inputs, source.results, source.datum));
  heading(doc, 'Design flood events', 50);
  eventsTable(doc, source);
  drawReservoirInputs(doc, source.inputs, source.datum);
  heading(doc, 'Flood-level limits and freeboard', 50);
  limitsTable(doc, source);
  heading(doc, 'Method settings');
  fields(doc, methodRows(source));
}
