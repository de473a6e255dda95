import { criticalDepth } from '../critical-depth';
import { EngineError, InvalidInputError, NoPhysicalSolutionError, requirePositive } from '../errors';
import type { FlowSection } from '../section';
import { brentRoot, expandBracketUpward } from '../solvers';
import type { CubicMetresPerSecond, Metres } from '../units';
import { approachState } from './approach';
import { freeFlowRating } from './ratings';
import { submergenceState, submergenceWarnings, tailwaterHead } from './submergence';
import { validityWarnings } from './validity-warnings';
import type { FreeFlowRating, WeirHeadResult, WeirOptions, WeirSpec } from './weir-types';

const HEAD_TOLERANCE: Metres = 1e-12;
const MAX_HEAD: Metres = 1000;

interface HeadProblem {
  spec: WeirSpec;
  rating: FreeFlowRating;
  approach: FlowSection;
  discharge: CubicMetresPerSecond;
  addsApproachVelocity: boolean;
  tailwater: Metres;
  energyCoefficient: number | undefined;
  field: string;
}

/** The head the rating's equation takes at measured head h: h plus the approach-velocity head, or h. */
function ratingEnergyHead(problem: HeadProblem, head: Metres): Metres {
  if (!problem.addsApproachVelocity) return head;
  const { approach, spec, discharge, energyCoefficient, field } = problem;
  return head + approachState(approach, spec.sillHeight, head, discharge, energyCoefficient, field).velocityHead;
}

/** Discharge the weir passes at head h, with its submergence factor, minus the discharge wanted. */
function dischargeSurplus(problem: HeadProblem, head: Metres): number {
  const energyHead = ratingEnergyHead(problem, head);
  const factor = problem.rating.submergence.factor(head, energyHead, problem.tailwater);
  if (factor === 0) return -problem.discharge;
  return problem.rating.discharge(head, energyHead) * factor - problem.discharge;
}

/**
 * Lowest head searched. With the approach velocity in the equation, the approach flow must stay
 * subcritical (depth P + h above the approach's critical depth): there the energy head rises with h,
 * so the surplus rises with h and the root is unique.
 */
function lowestHead(problem: HeadProblem): Metres {
  const floor = Math.max(problem.tailwater, problem.rating.headFloor ?? 0);
  if (!problem.addsApproachVelocity) return floor;
  const subcriticalFloor = criticalDepth(problem.approach, problem.discharge) - problem.spec.sillHeight;
  return Math.max(floor, subcriticalFloor, 0);
}

function solveHead(problem: HeadProblem): { head: Metres; iterations: number } {
  const { field, rating } = problem;
  let iterations = 0;
  const surplus = (head: Metres) => {
    iterations++;
    return dischargeSurplus(problem, head);
  };
  const lo = lowestHead(problem);
  if (lo > 0 && surplus(lo) > 0) {
    throw new NoPhysicalSolutionError(
      field,
      'weir-no-control',
      'the crest is too low for this discharge: the flow approaching the weir would pass critical depth before reaching it, so the weir does not control the upstream level',
    );
  }
  const maxHead = Math.min(rating.headLimit ?? MAX_HEAD, MAX_HEAD);
  const bracket = lo < maxHead ? expandBracketUpward(surplus, lo, lo + Math.min(0.1, maxHead - lo), { maxHi: maxHead, field }) : null;
  if (bracket === null) {
    if (problem.spec.kind === 'rating-table') {
      throw new InvalidInputError(`${field}.ratingTable`, `does not reach the discharge ${problem.discharge.toPrecision(4)} m³/s; extend the table`);
    }
    throw new NoPhysicalSolutionError(field, 'weir-capacity', `the weir cannot pass ${problem.discharge.toPrecision(4)} m³/s at any head up to ${maxHead.toPrecision(4)} m`);
  }
  const head = brentRoot(surplus, bracket[0], bracket[1], { tolerance: HEAD_TOLERANCE, field });
  return { head, iterations };
}

function checkRatingTableCovers(rating: ReturnType<typeof freeFlowRating>, discharge: CubicMetresPerSecond, field: string): void {
  const range = rating.dischargeRange;
  if (range === undefined) return;
  if (discharge < range[0] || discharge > range[1]) {
    throw new InvalidInputError(
      `${field}.ratingTable`,
      `covers ${range[0]}–${range[1]} m³/s, which does not include the discharge ${discharge.toPrecision(4)} m³/s; extend the table`,
    );
  }
}

function runSolve(problem: HeadProblem): { head: Metres; iterations: number } {
  try {
    return solveHead(problem);
  } catch (error) {
    if (error instanceof EngineError && !(error instanceof InvalidInputError) && !(error instanceof NoPhysicalSolutionError)) {
      throw new NoPhysicalSolutionError(problem.field, 'weir-no-solution', `no head over the crest passes ${problem.discharge.toPrecision(4)} m³/s (${error.message})`);
    }
    throw error;
  }
}

/** Upstream head over the crest that passes the discharge, with the approach-velocity head and submergence. */
export function weirHead(spec: WeirSpec, discharge: CubicMetresPerSecond, approach: FlowSection, opts: WeirOptions = {}): WeirHeadResult {
  const field = opts.field ?? 'control';
  requirePositive(discharge, 'discharge');
  const rating = freeFlowRating(spec, field);
  checkRatingTableCovers(rating, discharge, field);
  const tailwater = spec.tailwaterDepth === undefined ? 0 : tailwaterHead(spec.tailwaterDepth, spec.sillHeight);
  const addsApproachVelocity = spec.approachVelocity !== false && rating.usesEnergyHead;
  const problem: HeadProblem = { spec, rating, approach, discharge, addsApproachVelocity, tailwater, energyCoefficient: opts.energyCoefficient, field };
  const { head, iterations } = runSolve(problem);
  const flow = approachState(approach, spec.sillHeight, head, discharge, opts.energyCoefficient, field);
  const equationHead = ratingEnergyHead(problem, head);
  const submergence = spec.tailwaterDepth === undefined ? null : submergenceState(rating.submergence, head, equationHead, tailwater);
  const validity = rating.validity(head, equationHead);
  const warnings = [...rating.notes, ...validityWarnings(validity)];
  if (spec.approachVelocity === true && !rating.usesEnergyHead) {
    warnings.push('This coefficient already allows for the approach velocity, so the approach-velocity head was not added again.');
  }
  if (submergence) warnings.push(...submergenceWarnings(rating.submergence, submergence));
  if (submergence && !submergence.modular && spec.kind === 'ogee') {
    warnings.push("Villemonte's relation, fitted to sharp-crested weirs, stands in for the ogee's own submergence curves (USBR, Design of Small Dams, 1987, ch. 9); check the upstream level against them.");
  }
  if (flow.overtopped) warnings.push('The water at the weir stands above the top of the approach section.');
  return {
    head,
    energyHead: head + flow.velocityHead,
    approachVelocity: flow.velocity,
    coefficient: rating.coefficient(head, equationHead),
    coefficientSource: rating.coefficientSource,
    coefficientIsDefault: rating.coefficientIsDefault,
    coefficientForm: rating.coefficientForm,
    iterations,
    submergence,
    validity,
    warnings,
  };
}
