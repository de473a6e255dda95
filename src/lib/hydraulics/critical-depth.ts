// Critical depth: the depth at which the Froude number αQ²T/(gA³) equals 1.
import { FROUDE_PROOF_MARGIN } from './above-critical';
import { DEEPEST_OPEN_DEPTH, breakpointDepthGrid, downwardBracket, finiteDepthGrid, hasBreakpoints, openDepthBracket } from './depth-brackets';
import { NoPhysicalSolutionError, requirePositive } from './errors';
import { specificEnergy } from './flow-properties';
import { type Bracket, type SignProof, provenSignChangeBrackets, rootInBracket, signChangeBrackets } from './root-scan';
import type { FlowSection } from './section';
import { type FroudeFactorBounds, emptySample, sampleSection } from './section-sample';
import { requireDepth } from './section-state';
import { rememberingRecent } from './solvers';
import type { CubicMetresPerSecond, Metres } from './units';
import { GRAVITY } from './units';

export interface CriticalDepthOptions {
  /** Path of the section in errors when critical depth lies above it, default 'reach.section'. */
  field?: string;
  /** Path of the discharge in errors, default 'discharge'. */
  dischargeField?: string;
}

/** Tolerance on |Fr − 1| that tells a root from a jump in top width (where the residual changes sign without a root). */
const ROOT_CHECK = 1e-6;

function atBreakpoint(section: FlowSection, y: Metres): boolean {
  const breakpoints = hasBreakpoints(section) ? section.breakpointDepths : [];
  return breakpoints.some((d) => Math.abs(d - y) <= 1e-8 * section.maxDepth);
}

/**
 * A converged bracket is a root of Fr = 1 unless it sits on a ground breakpoint where the top width jumps
 * (a flat berm starting to flood) and Fr there is not 1: then the sign change was the jump itself.
 */
export function isCriticalRoot(section: FlowSection, y: Metres, discharge: CubicMetresPerSecond, momentumOnly: boolean): boolean {
  if (!(y > 0)) return false;
  const state = section.stateAtDepth(y);
  if (!(state.area > 0)) return false;
  const alpha = momentumOnly ? 1 : state.energyCoefficient;
  const froude = (discharge / state.area) * Math.sqrt((alpha * state.topWidth) / (GRAVITY * state.area));
  return Math.abs(froude - 1) <= ROOT_CHECK || !atBreakpoint(section, y);
}

/**
 * √g A^(3/2) − Q √(αT): zero exactly where Fr² = α Q² T/(g A³) = 1 (Chow, Open-Channel Hydraulics, 1959, §4-2,
 * criterion for critical flow Z = A√(A/T) = Q√(α/g) — from memory). Negative below critical depth, positive above;
 * square roots rather than cubes keep it clear of overflow, and a brim-full pipe (T = 0) stays finite.
 */
export function criticalResidual(section: FlowSection, discharge: CubicMetresPerSecond, momentumOnly = false): (y: Metres) => number {
  const rootGravity = Math.sqrt(GRAVITY);
  const sample = emptySample();
  return (y) => {
    requireDepth(y);
    const state = sampleSection(section, y, sample);
    const alpha = momentumOnly ? 1 : state.energyCoefficient;
    return rootGravity * state.area * Math.sqrt(state.area) - discharge * Math.sqrt(alpha * state.topWidth);
  };
}

/**
 * The sign of criticalResidual over a range of depths, proven from the section's bounds on αT/A³ there: the residual
 * is positive where Fr² = Q²·αT/(gA³) < 1 and negative where Fr² > 1 (Chow 1959 §4-2 criterion — from memory). Why:
 * above and below its critical depths a section's residual keeps one sign, and a proof for a whole stretch costs
 * about two evaluations.
 */
function criticalResidualProof(section: FlowSection, discharge: CubicMetresPerSecond): SignProof | undefined {
  if (section.froudeFactorBoundsInto === undefined) return undefined;
  const scale = (discharge * discharge) / GRAVITY;
  const bounds: FroudeFactorBounds = { least: 0, most: Infinity };
  // Called as a method, not bound: a bound function is one more object per section and a call the compiler cannot inline.
  const boundsOf = section as Required<Pick<FlowSection, 'froudeFactorBoundsInto'>>;
  return (from, to) => {
    boundsOf.froudeFactorBoundsInto(from, to, bounds);
    if (scale * bounds.most < 1 - FROUDE_PROOF_MARGIN) return 1;
    if (scale * bounds.least > 1 + FROUDE_PROOF_MARGIN) return -1;
    return 0;
  };
}

function finiteSectionBrackets(section: FlowSection, residual: (y: Metres) => number, grid: readonly Metres[] = finiteDepthGrid(section), proof?: SignProof): Bracket[] {
  const shallowest = residual(grid[0]) >= 0 ? downwardBracket(residual, grid[0]) : null;
  const brackets = proof === undefined ? signChangeBrackets(residual, grid) : provenSignChangeBrackets(residual, grid, proof);
  return shallowest ? [shallowest, ...brackets] : brackets;
}

/**
 * Every root of the residual in ascending order; compound sections may have several. Shared with the jump solver.
 * With `proof`, stretches of the grid proven free of a sign change are not evaluated.
 */
export function residualRoots(section: FlowSection, residual: (y: Metres) => number, isRoot: (y: Metres) => boolean, field: string, grid?: readonly Metres[], proof?: SignProof): Metres[] {
  if (section.maxDepth === Infinity) {
    const bracket = openDepthBracket(residual, field);
    if (bracket === null) throw new NoPhysicalSolutionError(field, 'depth-out-of-range', `no critical depth below ${DEEPEST_OPEN_DEPTH} m: check the discharge and its units`);
    return [rootInBracket(residual, bracket, field)];
  }
  const roots = finiteSectionBrackets(section, residual, grid, proof).map((bracket) => rootInBracket(residual, bracket, field));
  return [...new Set(roots)].filter(isRoot).sort((a, b) => a - b);
}

/** The critical depths of one section at one discharge, and the one of least specific energy once asked for. */
interface KnownCritical {
  discharge: CubicMetresPerSecond;
  roots: readonly Metres[];
  leastEnergy?: Metres;
}

/**
 * Critical depths found, per section and discharge (a short list: a section meets a few discharges). Why: one event
 * asks for the control section's critical depth for its regime, its weir and its profile, and a march for each
 * section's at every step onto it; sections never change once built. An empty list (overtopped) is kept too: the
 * error is raised afresh, with the caller's field names.
 */
const criticalRoots = new WeakMap<FlowSection, KnownCritical[]>();

function knownCritical(section: FlowSection, discharge: CubicMetresPerSecond, opts: CriticalDepthOptions): KnownCritical {
  const field = opts.field ?? 'reach.section';
  const dischargeField = opts.dischargeField ?? 'discharge';
  requirePositive(discharge, dischargeField);
  let known = criticalRoots.get(section);
  if (known === undefined) criticalRoots.set(section, (known = []));
  let entry = known.find((k) => k.discharge === discharge);
  if (entry === undefined) {
    const isRoot = (y: Metres) => isCriticalRoot(section, y, discharge, false);
    const grid = hasBreakpoints(section) ? breakpointDepthGrid(section) : undefined;
    const proof = criticalResidualProof(section, discharge);
    known.push((entry = { discharge, roots: residualRoots(section, rememberingRecent(criticalResidual(section, discharge)), isRoot, dischargeField, grid, proof) }));
  }
  if (entry.roots.length === 0) {
    throw new NoPhysicalSolutionError(
      field,
      'section-overtopped',
      `critical depth for ${discharge} m³/s lies above the top of the section (${section.maxDepth.toPrecision(4)} m deep): the flow would overtop it`,
    );
  }
  return entry;
}

/** Every depth where Fr = 1 within the section (Chow 1959 §4-2 criterion — from memory), ascending. */
export function criticalDepths(section: FlowSection, discharge: CubicMetresPerSecond, opts: CriticalDepthOptions = {}): Metres[] {
  return [...knownCritical(section, discharge, opts).roots];
}

/** The critical depth; where a compound section has several, the one with the least specific energy. */
export function criticalDepth(section: FlowSection, discharge: CubicMetresPerSecond, opts: CriticalDepthOptions = {}): Metres {
  const entry = knownCritical(section, discharge, opts);
  if (entry.leastEnergy === undefined) {
    const energies = entry.roots.map((y) => specificEnergy(section, y, discharge));
    entry.leastEnergy = entry.roots[energies.indexOf(Math.min(...energies))];
  }
  return entry.leastEnergy;
}
