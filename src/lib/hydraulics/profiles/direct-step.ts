// Backwater profile of a prismatic reach by the direct step method, refined until step-independent.
import { DEEPEST_OPEN_DEPTH } from '../depth-brackets';
import { EngineError, InvalidInputError, requireFinite, requirePositive } from '../errors';
import type { FlowSection } from '../section';
import type { CubicMetresPerSecond, Metres, Slope } from '../units';
import { type DepthSequence, geometricDepths, proportionalDepths } from './depth-grid';
import { type DirectStepReach, type MarchResult, directStepMarch, marchPoints } from './direct-step-march';
import { convergedMarch, fixedResolutionMarch } from './march-refinement';
import { odeSelfCheck } from './ode-self-check';
import { profilePointAt } from './point-state';
import type { GvfProfile, ProfileRun } from './profile-point';
import { type BackwaterRegime, backwaterRegime } from './profile-regime';
import type { RefinementOptions } from './step-refinement';
import { jumpReport } from './hydraulic-jump';

export interface DirectStepInput {
  section: FlowSection;
  discharge: CubicMetresPerSecond;
  bedSlope: Slope;
  controlDepth: Metres;
  bedLevelAtControl: Metres;
  reachLength: Metres;
  /** Relative distance from normal depth at which the profile counts as back to normal; default 0.01 (common practice). */
  normalDepthTolerance?: number;
  /** A fixed number of depth steps; omitted, the steps are refined automatically. */
  depthSteps?: number;
  refinement?: RefinementOptions;
  /** Skip the independent odex integration (it is run by default). */
  skipSelfCheck?: boolean;
}

const MAX_WIDENINGS = 60;

function runOnce(reach: DirectStepReach, regime: BackwaterRegime, steps: number): MarchResult {
  const control = regime.controlDepth;
  const limits = { endDepth: regime.endDepth, endsBy: regime.endsBy, maxSteps: steps };
  const sequence = (towards: Metres): DepthSequence =>
    regime.normalDepth === null ? proportionalDepths(control, towards, steps) : geometricDepths(control, towards, regime.normalDepth, steps);
  let march: MarchResult | null = null;
  if (regime.endDepth !== null) march = directStepMarch(reach, sequence(regime.endDepth), limits);
  else {
    // No end depth (H2, A2): widen the depth range until the reach end or the top of the section falls inside it.
    const deepest = Math.min(reach.section.maxDepth, DEEPEST_OPEN_DEPTH);
    let upper = Math.min(2 * control, deepest);
    for (let i = 0; i < MAX_WIDENINGS && (march === null || march.stoppedBy === null); i++) {
      march = directStepMarch(reach, sequence(upper), limits);
      if (upper >= deepest) break;
      upper = Math.min((upper * upper) / control, deepest);
    }
  }
  if (march === null || march.stoppedBy === null) throw new EngineError('profile: the depth range never reached the end of the reach', 'profile', 'no-convergence');
  if (march.stoppedBy !== 'reach-end' || march.stepsTaken >= steps) return march;
  // The reach ended part-way through the depth range: spread all the steps over the depths actually reached.
  const depthAtEnd = march.table.depth[march.table.count - 1];
  const refined = directStepMarch(reach, sequence(depthAtEnd), { ...limits, maxSteps: 4 * steps + 16 });
  return refined.stoppedBy === null ? march : refined;
}

function asRun(reach: DirectStepReach, regime: BackwaterRegime, march: MarchResult): ProfileRun {
  const points = marchPoints(reach, march);
  const { jump, warnings } = jumpReport(regime, march.stoppedBy === 'hydraulic-jump' ? points[points.length - 1].distanceUpstream : null);
  if (march.stoppedBy === 'section-overtopped') warnings.push('the water reaches the top of the section before the profile ends; the profile stops there');
  return { points, stoppedBy: march.stoppedBy ?? 'reach-end', profileType: regime.profileType, jump, warnings };
}

function validated(input: DirectStepInput): number {
  requirePositive(input.reachLength, 'reach.length');
  requireFinite(input.bedLevelAtControl, 'reach.bedLevel');
  const tolerance = input.normalDepthTolerance ?? 0.01;
  requirePositive(tolerance, 'normalDepthTolerance');
  if (tolerance >= 0.5) throw new InvalidInputError('normalDepthTolerance', 'must be below 0.5 (it is a fraction of the normal depth)');
  if (input.depthSteps !== undefined && !(Number.isInteger(input.depthSteps) && input.depthSteps >= 1 && input.depthSteps <= 2 ** 20)) {
    throw new InvalidInputError('depthSteps', 'must be a whole number from 1 to 2²⁰');
  }
  return tolerance;
}

/**
 * The water-surface profile upstream of a control on a prismatic reach, stepping in depth from the control
 * towards normal depth (Chow, Open-Channel Hydraulics, 1959, §10-3). Stops at the reach end, within the
 * tolerance of normal depth, at a hydraulic jump (S1) or at the top of the section, whichever comes first.
 */
export function directStepProfile(input: DirectStepInput): GvfProfile {
  const tolerance = validated(input);
  const reach: DirectStepReach = input;
  const regime = backwaterRegime(input.section, input.discharge, input.bedSlope, input.controlDepth, tolerance);
  if (regime.zeroLength) {
    const control = profilePointAt(input.section, input.discharge, regime.controlDepth, 0, input.bedLevelAtControl);
    const { jump, warnings } = jumpReport(regime, regime.endsBy === 'hydraulic-jump' ? 0 : null);
    return { points: [control], stoppedBy: regime.endsBy ?? 'reach-end', profileType: regime.profileType, jump, refinement: { stepsUsed: 0, extentChangeOnHalving: 0, converged: true }, selfCheck: null, warnings };
  }
  const compute = (steps: number) => runOnce(reach, regime, Math.max(1, Math.round(steps)));
  const refined =
    input.depthSteps === undefined
      ? convergedMarch(compute, { ...input.refinement, bedSlope: input.bedSlope, reachLength: input.reachLength })
      : fixedResolutionMarch(compute, input.depthSteps, input.refinement);
  const run = asRun(reach, regime, refined.march);
  if (refined.warning !== null) run.warnings.push(refined.warning);
  const refinement = { stepsUsed: run.points.length - 1, extentChangeOnHalving: refined.change.extentChange, converged: refined.converged };
  const selfCheck = input.skipSelfCheck ? null : odeSelfCheck({ section: input.section, discharge: input.discharge, bedSlope: input.bedSlope, points: run.points });
  const warnings = [...run.warnings, ...(selfCheck?.warnings ?? [])];
  return { ...run, refinement, selfCheck: selfCheck?.report ?? null, warnings };
}
