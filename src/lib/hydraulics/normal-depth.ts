// Normal (uniform-flow) depth from Manning's formula: Q = K(y) √S₀.
import { DEEPEST_OPEN_DEPTH, downwardBracket, finiteDepthGrid, openDepthBracket } from './depth-brackets';
import { NoPhysicalSolutionError, requireFinite, requirePositive } from './errors';
import { CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO } from './prismatic/circle-geometry';
import { type Bracket, firstSignChange, rootInBracket } from './root-scan';
import type { FlowSection } from './section';
import { emptySample, sampleSection } from './section-sample';
import { requireDepth } from './section-state';
import type { CubicMetresPerSecond, Metres, Slope } from './units';

export interface NormalDepthOptions {
  /** Path of the bed slope in errors, default 'reach.bedSlope'. */
  field?: string;
  /** Path of the discharge in errors, default 'discharge'. */
  dischargeField?: string;
}

const scratch = emptySample();

function uniformFlowCapacity(section: FlowSection, depth: Metres, bedSlope: Slope): CubicMetresPerSecond {
  requireDepth(depth);
  return sampleSection(section, depth, scratch).conveyance * Math.sqrt(bedSlope);
}

function capacityExceeded(field: string, discharge: number, capacity: number, detail: string): NoPhysicalSolutionError {
  return new NoPhysicalSolutionError(
    field,
    'exceeds-capacity',
    `no normal depth: ${discharge} m³/s is more than the section can carry in uniform flow (${capacity.toPrecision(4)} m³/s ${detail})`,
  );
}

/** Circle: Q = K√S has two roots above the full-bore capacity; the lower one, below the conveyance peak, is the usual one. */
function circularBracket(section: FlowSection, residual: (y: Metres) => number, discharge: number, bedSlope: Slope, field: string): Bracket {
  const peakDepth = CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO * section.maxDepth;
  if (residual(peakDepth) < 0) {
    const peak = uniformFlowCapacity(section, peakDepth, bedSlope);
    const full = uniformFlowCapacity(section, section.maxDepth, bedSlope);
    throw capacityExceeded(field, discharge, peak, `at its best depth ${(peakDepth / section.maxDepth).toFixed(3)} D; full-bore capacity ${full.toPrecision(4)} m³/s`);
  }
  return [0, peakDepth];
}

function surveyedBracket(section: FlowSection, residual: (y: Metres) => number, discharge: number, bedSlope: Slope, field: string): Bracket {
  const bracket = firstSignChange(residual, [0, ...finiteDepthGrid(section)]);
  if (bracket === null) {
    throw capacityExceeded(field, discharge, uniformFlowCapacity(section, section.maxDepth, bedSlope), 'with the water at the lower end of the section');
  }
  return bracket;
}

/**
 * The depth at which Manning's formula carries `discharge` on `bedSlope` (Manning 1891; Chow 1959, §6-3 — from memory),
 * by Brent's method on a bracket (the lowest root when the conveyance is not monotonic).
 */
export function normalDepth(section: FlowSection, discharge: CubicMetresPerSecond, bedSlope: Slope, opts: NormalDepthOptions = {}): Metres {
  const slopeField = opts.field ?? 'reach.bedSlope';
  const dischargeField = opts.dischargeField ?? 'discharge';
  requirePositive(discharge, dischargeField);
  requireFinite(bedSlope, slopeField);
  if (bedSlope <= 0) {
    const bed = bedSlope === 0 ? 'horizontal' : 'adverse';
    throw new NoPhysicalSolutionError(slopeField, 'no-normal-depth', `no normal depth: the bed is ${bed}, uniform flow cannot exist`);
  }
  let known = normalDepths.get(section);
  if (known === undefined) normalDepths.set(section, (known = new Map()));
  const key = `${discharge} ${bedSlope}`;
  let depth = known.get(key);
  if (depth === undefined) known.set(key, (depth = solvedNormalDepth(section, discharge, bedSlope, dischargeField)));
  return depth;
}

/**
 * Normal depths found, per section and discharge and slope. Why: one event asks for the control section's normal
 * depth for its regime, its profile and its levels without the scheme; sections never change once built.
 */
const normalDepths = new WeakMap<FlowSection, Map<string, Metres>>();

function solvedNormalDepth(section: FlowSection, discharge: CubicMetresPerSecond, bedSlope: Slope, dischargeField: string): Metres {
  const residual = (y: Metres) => uniformFlowCapacity(section, y, bedSlope) - discharge;
  let bracket: Bracket | null;
  if (section.maxDepth === Infinity) bracket = openDepthBracket(residual, dischargeField);
  else if (section.shape === 'circular') bracket = circularBracket(section, residual, discharge, bedSlope, dischargeField);
  else bracket = surveyedBracket(section, residual, discharge, bedSlope, dischargeField);
  if (bracket !== null && bracket[0] === 0) bracket = downwardBracket(residual, bracket[1]);
  if (bracket === null) {
    throw new NoPhysicalSolutionError(dischargeField, 'depth-out-of-range', `no normal depth below ${DEEPEST_OPEN_DEPTH} m: check the discharge and its units`);
  }
  return rootInBracket(residual, bracket, dischargeField);
}
