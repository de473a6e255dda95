// The with-scheme and without-scheme profiles of one event, by the method the case asks for.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ReachModel } from './case-reach';
import { InvalidInputError } from './errors';
import { directStepProfile } from './profiles/direct-step';
import type { GvfProfile } from './profiles/profile-point';
import { meanSlopeNormalDepths } from './profiles/reach-geometry';
import { prismaticReach, type ReachStation } from './profiles/reach-sections';
import { standardStepProfile } from './profiles/standard-step';
import { type WithoutScheme, withoutSchemePrismatic, withoutSchemeSurveyed } from './profiles/without-scheme';
import type { CubicMetresPerSecond, Metres } from './units';

type ProfileSettings = CaseInput['profile'];

export function profileMethod(settings: ProfileSettings, model: ReachModel): 'direct-step' | 'standard-step' {
  const method = settings.method ?? (model.kind === 'prismatic' ? 'direct-step' : 'standard-step');
  if (method === 'direct-step' && model.kind !== 'prismatic') {
    throw new InvalidInputError('profile.method', 'must be standard-step for a surveyed reach: the direct step method needs a prismatic channel');
  }
  return method;
}

function stationsOf(model: ReachModel): readonly ReachStation[] {
  if (model.stations) return model.stations;
  const section = model.controlSection;
  // Two stations suffice: the standard step interpolates the same section between them as it refines.
  return prismaticReach({ section, bedSlope: model.bedSlope, bedLevelAtControl: model.bedLevelAtControl, reachLength: model.length, spacing: model.length });
}

function standardStepSettings(settings: ProfileSettings) {
  return {
    ...(settings.frictionSlopeAveraging ? { frictionAveraging: settings.frictionSlopeAveraging } : {}),
    ...(settings.expansionCoefficient !== undefined ? { expansionCoefficient: settings.expansionCoefficient } : {}),
    ...(settings.contractionCoefficient !== undefined ? { contractionCoefficient: settings.contractionCoefficient } : {}),
  };
}

/** The backwater profile upstream of the control starting at `controlDepth` above the bed there. */
export function withSchemeProfile(model: ReachModel, settings: ProfileSettings, discharge: CubicMetresPerSecond, controlDepth: Metres, skipSelfCheck: boolean): GvfProfile {
  const tolerance = settings.normalDepthTolerance;
  if (profileMethod(settings, model) === 'direct-step' && model.prismatic) {
    return directStepProfile({
      section: model.prismatic.section,
      discharge,
      bedSlope: model.bedSlope,
      controlDepth,
      bedLevelAtControl: model.bedLevelAtControl,
      reachLength: model.length,
      normalDepthTolerance: tolerance,
      skipSelfCheck,
    });
  }
  const reach = stationsOf(model);
  return standardStepProfile({
    reach,
    discharge,
    controlLevel: model.bedLevelAtControl + controlDepth,
    normalDepthTolerance: tolerance,
    ...standardStepSettings(settings),
    ...(model.kind === 'surveyed' ? { reachNormalDepthAt: meanSlopeNormalDepths(reach, discharge) } : {}),
    skipSelfCheck,
  });
}

/** The levels without the scheme: normal flow, or the existing control's own profile. */
export function withoutSchemeLevels(
  model: ReachModel,
  settings: ProfileSettings,
  discharge: CubicMetresPerSecond,
  existingControlDepth: Metres | undefined,
  distances: readonly Metres[],
): WithoutScheme {
  if (model.prismatic) {
    return withoutSchemePrismatic({
      section: model.prismatic.section,
      discharge,
      bedSlope: model.bedSlope,
      bedLevelAtControl: model.bedLevelAtControl,
      reachLength: model.length,
      distances,
      normalDepthTolerance: settings.normalDepthTolerance,
      ...(existingControlDepth !== undefined ? { existingControlDepth } : {}),
    });
  }
  return withoutSchemeSurveyed({
    reach: stationsOf(model),
    discharge,
    ...standardStepSettings(settings),
    ...(existingControlDepth !== undefined ? { existingControlLevel: model.bedLevelAtControl + existingControlDepth } : {}),
  });
}
