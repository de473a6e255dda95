// The water levels without the scheme, against which its afflux is measured.
import { EngineError, InvalidInputError, NoPhysicalSolutionError } from '../errors';
import { normalDepth } from '../normal-depth';
import type { FlowSection } from '../section';
import type { CubicMetresPerSecond, Metres, Slope } from '../units';
import { directStepProfile } from './direct-step';
import type { FrictionAveraging } from './friction-averaging';
import { profilePointAt } from './point-state';
import { pointAtDistance } from './profile-interpolation';
import type { GvfProfile, ProfilePoint } from './profile-point';
import { meanBedSlope } from './reach-geometry';
import type { ReachStation } from './reach-sections';
import { standardStepProfile } from './standard-step';
import type { RefinementOptions } from './step-refinement';

export interface WithoutScheme {
  points: ProfilePoint[];
  /** The profile behind an existing control (or along a surveyed reach); null for plain normal flow. */
  profile: GvfProfile | null;
  /** Without-scheme water level anywhere upstream of the control. */
  levelAt: (distanceUpstream: Metres) => Metres;
}

function requiredNormalDepth(section: FlowSection, discharge: CubicMetresPerSecond, bedSlope: Slope): Metres {
  try {
    return normalDepth(section, discharge, bedSlope);
  } catch (error) {
    if (error instanceof EngineError && error.code === 'no-normal-depth') {
      throw new NoPhysicalSolutionError('withoutScheme.controlDepth', 'no-normal-depth', 'the bed is horizontal or adverse, so the flow without the scheme has no normal depth: give the existing control depth');
    }
    throw error;
  }
}

/**
 * Prismatic reach: normal depth at the given distances (Manning's uniform flow), or, with an existing control,
 * that control's own direct-step profile, back to normal depth beyond its end.
 */
export function withoutSchemePrismatic(input: {
  section: FlowSection;
  discharge: CubicMetresPerSecond;
  bedSlope: Slope;
  bedLevelAtControl: Metres;
  reachLength: Metres;
  distances: readonly Metres[];
  existingControlDepth?: Metres;
  normalDepthTolerance?: number;
  refinement?: RefinementOptions;
}): WithoutScheme {
  const { section, discharge, bedSlope, bedLevelAtControl } = input;
  const bedAt = (x: Metres) => bedLevelAtControl + bedSlope * x;
  if (input.existingControlDepth === undefined) {
    const yn = requiredNormalDepth(section, discharge, bedSlope);
    const points = [...input.distances].sort((a, b) => a - b).map((x) => profilePointAt(section, discharge, yn, x, bedAt(x)));
    return { points, profile: null, levelAt: (x) => bedAt(x) + yn };
  }
  const profile = directStepProfile({ ...input, controlDepth: input.existingControlDepth });
  const yn = bedSlope > 0 ? normalDepth(section, discharge, bedSlope) : null;
  const levelAt = (x: Metres) => {
    const onProfile = pointAtDistance(profile.points, x);
    if (onProfile !== null) return onProfile.waterLevel;
    if (yn !== null) return bedAt(x) + yn;
    throw new InvalidInputError('distanceUpstream', `${x} m lies beyond the reach (${input.reachLength} m) on a bed with no normal depth`);
  };
  return { points: profile.points, profile, levelAt };
}

/**
 * Surveyed reach: a standard-step profile along the whole reach from the existing control level, or else from
 * normal depth at the first section for the reach's mean bed slope. Beyond the last computed point the level
 * is carried on parallel to the mean bed (normal flow).
 */
export function withoutSchemeSurveyed(input: {
  reach: readonly ReachStation[];
  discharge: CubicMetresPerSecond;
  existingControlLevel?: Metres;
  frictionAveraging?: FrictionAveraging;
  expansionCoefficient?: number;
  contractionCoefficient?: number;
  maxSpacing?: Metres;
  refinement?: RefinementOptions;
}): WithoutScheme {
  const first = input.reach[0];
  const slope = meanBedSlope(input.reach);
  const controlLevel = input.existingControlLevel ?? first.bedLevel + requiredNormalDepth(first.section, input.discharge, slope);
  const profile = standardStepProfile({ ...input, controlLevel, reachNormalDepthAt: () => null });
  const last = profile.points[profile.points.length - 1];
  const levelAt = (x: Metres) => pointAtDistance(profile.points, x)?.waterLevel ?? last.waterLevel + slope * (x - last.distanceUpstream);
  return { points: profile.points, profile, levelAt };
}
