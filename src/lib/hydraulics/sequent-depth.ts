// Sequent (conjugate) depths of a hydraulic jump: equal specific force M = Q²/(gA) + Aȳ on both sides.
import { DEEPEST_OPEN_DEPTH, downwardBracket, finiteDepthGrid } from './depth-brackets';
import { NoPhysicalSolutionError, requirePositive } from './errors';
import { criticalResidual, isCriticalRoot, residualRoots } from './critical-depth';
import { specificForce, wettedState } from './flow-properties';
import { type Bracket, firstSignChange, rootInBracket } from './root-scan';
import type { FlowSection } from './section';
import { expandBracketUpward } from './solvers';
import type { CubicMetresPerSecond, Metres } from './units';

export interface SequentDepthOptions {
  /** Path of the section in errors when the jump would overtop it, default 'reach.section'. */
  field?: string;
  depthField?: string;
  dischargeField?: string;
}

/**
 * Depth of least specific force: dM/dy = A − Q²T/(gA²) = 0, i.e. Q²T/(gA³) = 1 with α = 1
 * (Chow, Open-Channel Hydraulics, 1959, §3-7 — from memory). Where a compound section has several, the lowest M.
 */
export function momentumMinimumDepth(section: FlowSection, discharge: CubicMetresPerSecond, field: string): Metres | null {
  const isRoot = (y: Metres) => isCriticalRoot(section, y, discharge, true);
  const roots = residualRoots(section, criticalResidual(section, discharge, true), isRoot, field);
  if (roots.length === 0) return null;
  const forces = roots.map((y) => specificForce(section, y, discharge));
  return roots[forces.indexOf(Math.min(...forces))];
}

function overtopped(field: string, depth: Metres, section: FlowSection): NoPhysicalSolutionError {
  return new NoPhysicalSolutionError(
    field,
    'section-overtopped',
    `the depth sequent to ${depth.toPrecision(4)} m lies above the top of the section (${section.maxDepth.toPrecision(4)} m deep)`,
  );
}

function bracketAbove(section: FlowSection, excess: (y: Metres) => number, from: Metres, field: string): Bracket | null {
  if (section.maxDepth === Infinity) return expandBracketUpward(excess, from, 2 * from, { maxHi: DEEPEST_OPEN_DEPTH, field });
  return firstSignChange(excess, [from, ...finiteDepthGrid(section, from)]);
}

/**
 * The depth on the other side of a hydraulic jump from `depth` (either side), from M(y₁) = M(y₂)
 * (Chow 1959, §3-7 and ch. 15; Henderson, Open Channel Flow, 1966, ch. 3 — sections from memory).
 * For a rectangle this is Bélanger's y₂/y₁ = ½(√(1 + 8Fr₁²) − 1) (Bélanger 1828; Chow 1959 eq. 3-20 — from memory).
 */
export function sequentDepth(section: FlowSection, depth: Metres, discharge: CubicMetresPerSecond, opts: SequentDepthOptions = {}): Metres {
  const field = opts.field ?? 'reach.section';
  const fields = { depthField: opts.depthField, dischargeField: opts.dischargeField };
  requirePositive(discharge, opts.dischargeField ?? 'discharge');
  wettedState(section, depth, discharge, fields);
  if (depth > section.maxDepth) throw overtopped(field, depth, section);
  const pivot = momentumMinimumDepth(section, discharge, opts.dischargeField ?? 'discharge');
  if (pivot === null) throw overtopped(field, depth, section);
  if (Math.abs(depth - pivot) <= 1e-12 * pivot) return depth;
  const force = specificForce(section, depth, discharge);
  const excess = (y: Metres) => specificForce(section, y, discharge) - force;
  const bracket = depth < pivot ? bracketAbove(section, excess, pivot, field) : downwardBracket(excess, pivot);
  if (bracket === null) throw overtopped(field, depth, section);
  return rootInBracket(excess, bracket, field);
}
