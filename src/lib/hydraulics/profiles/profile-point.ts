// The common result of every water-surface profile calculation (direct step, standard step, without-scheme).
import type { Dimensionless, Metres, MetresPerSecond, Slope } from '../units';
import type { ProfileType } from './profile-type';

/** One computed point of a water-surface profile; distances are measured upstream from the control. */
export interface ProfilePoint {
  distanceUpstream: Metres;
  depth: Metres;
  waterLevel: Metres;
  bedLevel: Metres;
  velocity: MetresPerSecond;
  froude: Dimensionless;
  frictionSlope: Slope;
  /** Water level plus the velocity head αV²/2g. */
  energyLevel: Metres;
}

export type ProfileStop = 'reach-end' | 'normal-depth' | 'hydraulic-jump' | 'section-overtopped' | 'critical-depth';

export interface JumpLocation {
  distanceUpstream: Metres;
  /** Depth of the supercritical flow arriving at the jump (its upstream side). */
  upstreamDepth: Metres;
  /** Sequent depth on the jump's downstream side, where the backwater profile ends. */
  downstreamDepth: Metres;
}

export interface RefinementReport {
  stepsUsed: number;
  /** Relative change in the extent at the last halving of the step. */
  extentChangeOnHalving: number;
  converged: boolean;
}

export interface SelfCheckReport {
  method: string;
  maxLevelDifference: Metres;
  /** Relative difference in extent between the profile and the independent integration. */
  extentDifference: number;
}

export interface GvfProfile {
  /** From the control (distanceUpstream exactly 0) upstream, distance non-decreasing. */
  points: ProfilePoint[];
  stoppedBy: ProfileStop;
  profileType: ProfileType;
  jump: JumpLocation | null;
  refinement: RefinementReport;
  selfCheck: SelfCheckReport | null;
  warnings: string[];
}

/** One calculation at one step size, before refinement and self-check are reported. */
export type ProfileRun = Pick<GvfProfile, 'points' | 'stoppedBy' | 'profileType' | 'jump' | 'warnings'>;

/** Distance of the last point: how far upstream the profile was computed. */
export function profileExtent(profile: { points: readonly ProfilePoint[] }): Metres {
  return profile.points.length === 0 ? 0 : profile.points[profile.points.length - 1].distanceUpstream;
}
