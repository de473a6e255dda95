// Backwater profile through a list of cross-sections by the standard step method, refined until spacing-independent.
import { InvalidInputError, requireFinite, requireNonNegative, requirePositive } from '../errors';
import type { CubicMetresPerSecond, Metres } from '../units';
import type { BalanceSettings } from './energy-balance';
import { FRICTION_AVERAGING_METHODS, type FrictionAveraging } from './friction-averaging';
import { odeSelfCheck } from './ode-self-check';
import { profilePointAt } from './point-state';
import type { GvfProfile, ProfileRun } from './profile-point';
import { backwaterRegime } from './profile-regime';
import { isPrismaticReach, meanBedSlope } from './reach-geometry';
import { type ReachStation, refinedReach, rememberedStationsBetween } from './reach-sections';
import { type StandardStepPass, rememberedJumpDepths, standardStepMarch } from './standard-step-march';
import { type RefinementOptions, convergedProfile, fixedResolutionProfile } from './step-refinement';
import { jumpReport } from './hydraulic-jump';

/**
 * The standard step balances energy over each step with the two ends' friction slopes averaged, a trapezoidal
 * rule, so its error falls as the square of the step (second order; Chow 1959, §10-4 — from memory). Why it
 * matters: a surveyed reach's interpolated sections are most of its cost, and one halving fewer halves them.
 */
const STANDARD_STEP_ORDER = 2;

export interface StandardStepInput {
  /** Stations from the control (distance 0) upstream, distances strictly increasing. */
  reach: readonly ReachStation[];
  discharge: CubicMetresPerSecond;
  /** Water level at the control section (the first station). */
  controlLevel: Metres;
  frictionAveraging?: FrictionAveraging;
  /** Loss coefficient where the flow slows down going downstream; default 0.3 (gradual transition, common practice). */
  expansionCoefficient?: number;
  /** Loss coefficient where the flow speeds up going downstream; default 0.1 (gradual transition, common practice). */
  contractionCoefficient?: number;
  /** Largest distance between computed sections; omitted, it is halved automatically until the profile settles. */
  maxSpacing?: Metres;
  normalDepthTolerance?: number;
  /** Normal depth at a station, to stop once the flow is back to normal; a prismatic reach uses its own by default. */
  reachNormalDepthAt?: (station: ReachStation) => Metres | null;
  refinement?: RefinementOptions;
  skipSelfCheck?: boolean;
}

function validatedReach(reach: readonly ReachStation[]): Metres {
  if (!Array.isArray(reach) || reach.length < 2) throw new InvalidInputError('reach', 'needs at least two stations');
  if (reach[0].distanceUpstream !== 0) throw new InvalidInputError('reach.0.distanceUpstream', 'must be 0: the first station is the control section');
  reach.forEach((station, i) => {
    requireFinite(station.bedLevel, `reach.${i}.bedLevel`);
    if (i > 0 && !(station.distanceUpstream > reach[i - 1].distanceUpstream)) throw new InvalidInputError(`reach.${i}.distanceUpstream`, 'must be greater than the distance of the station before it');
  });
  return reach[reach.length - 1].distanceUpstream;
}

function validatedSettings(input: StandardStepInput): BalanceSettings {
  const frictionAveraging = input.frictionAveraging ?? 'average-conveyance';
  if (!FRICTION_AVERAGING_METHODS.includes(frictionAveraging)) throw new InvalidInputError('frictionAveraging', `must be one of ${FRICTION_AVERAGING_METHODS.join(', ')}`);
  const expansionCoefficient = input.expansionCoefficient ?? 0.3;
  const contractionCoefficient = input.contractionCoefficient ?? 0.1;
  requireNonNegative(expansionCoefficient, 'expansionCoefficient');
  requireNonNegative(contractionCoefficient, 'contractionCoefficient');
  if (expansionCoefficient > 1) throw new InvalidInputError('expansionCoefficient', 'must not exceed 1');
  if (contractionCoefficient > 1) throw new InvalidInputError('contractionCoefficient', 'must not exceed 1');
  return { discharge: input.discharge, frictionAveraging, expansionCoefficient, contractionCoefficient };
}

/**
 * The water-surface profile upstream of the control through the reach's stations (Chow, Open-Channel Hydraulics,
 * 1959, §10-4, standard step method), with sections interpolated where they lie more than maxSpacing apart.
 * Stops at the reach end, back within the tolerance of normal depth, at a jump (steep reach), at a section
 * whose top the water would pass, or where the energy balance has no subcritical level.
 */
export function standardStepProfile(input: StandardStepInput): GvfProfile {
  const reachLength = validatedReach(input.reach);
  requirePositive(input.discharge, 'discharge');
  requireFinite(input.controlLevel, 'control.level');
  const settings = validatedSettings(input);
  const tolerance = input.normalDepthTolerance ?? 0.01;
  requirePositive(tolerance, 'normalDepthTolerance');
  if (tolerance >= 0.5) throw new InvalidInputError('normalDepthTolerance', 'must be below 0.5 (it is a fraction of the normal depth)');
  if (input.maxSpacing !== undefined) requirePositive(input.maxSpacing, 'maxSpacing');

  const first = input.reach[0];
  const prismatic = isPrismaticReach(input.reach);
  const slope = meanBedSlope(input.reach);
  const regime = backwaterRegime(first.section, input.discharge, slope, input.controlLevel - first.bedLevel, tolerance);
  const prismaticNormal = prismatic ? regime.normalDepth : null;
  const normalDepthAt = input.reachNormalDepthAt ?? (() => prismaticNormal);

  if (prismatic && regime.zeroLength) {
    const control = profilePointAt(first.section, input.discharge, regime.controlDepth, 0, first.bedLevel);
    const { jump, warnings } = jumpReport(regime, regime.endsBy === 'hydraulic-jump' ? 0 : null);
    return { points: [control], stoppedBy: regime.endsBy ?? 'reach-end', profileType: regime.profileType, jump, refinement: { stepsUsed: 0, extentChangeOnHalving: 0, converged: true }, selfCheck: null, warnings };
  }

  const jumpDepthAt = rememberedJumpDepths(input.discharge);
  const between = rememberedStationsBetween();
  const compute = (resolution: number): ProfileRun => {
    const { stations, warnings } = refinedReach(input.reach, reachLength / resolution, between);
    const pass: StandardStepPass = { stations, controlDepth: regime.controlDepth, settings, normalDepthTolerance: tolerance, normalDepthAt, profileType: regime.profileType, jumpDepthAt };
    const run = standardStepMarch(pass);
    return { ...run, warnings: [...warnings, ...run.warnings] };
  };
  const widestGap = input.reach.reduce((widest, s, i) => (i === 0 ? widest : Math.max(widest, s.distanceUpstream - input.reach[i - 1].distanceUpstream)), 0);
  const initialResolution = Math.max(16, reachLength / widestGap);
  const { run, refinement } =
    input.maxSpacing === undefined
      ? convergedProfile(compute, { initialResolution, maxResolution: Math.max(2 ** 14, 2 * initialResolution), ...input.refinement }, STANDARD_STEP_ORDER)
      : fixedResolutionProfile(compute, reachLength / input.maxSpacing, input.refinement);
  const selfCheck = prismatic && !input.skipSelfCheck ? odeSelfCheck({ section: first.section, discharge: input.discharge, bedSlope: slope, points: run.points }) : null;
  return { ...run, refinement, selfCheck: selfCheck?.report ?? null, warnings: [...run.warnings, ...(selfCheck?.warnings ?? [])] };
}
