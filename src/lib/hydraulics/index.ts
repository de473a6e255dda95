// Sillmark's hydraulic engine: the public API. Pure TypeScript, no Next, no database, no I/O.
// Units are SI throughout (metres, square metres, cubic metres per second, m/m slopes): see units.ts.
// Every formula cites its published source where it is implemented.

// Units and errors
export * from './units';
export { EngineError, InvalidInputError, NoPhysicalSolutionError } from './errors';

// Sections: FlowSection / SectionState (depth in m; area m²; perimeter, top width, radii in m; conveyance m³/s)
export type { FlowSection, SectionState } from './section';
export { prismaticSection, type PrismaticSection } from './prismatic-sections';
export { surveyedSection, type SurveyedSection } from './surveyed-section';
export { flowVelocity, froudeNumber, specificEnergy, specificForce, frictionSlope } from './flow-properties';

// Uniform and critical flow, jumps (depths in m)
export { brentRoot, expandBracketUpward } from './solvers';
export { normalDepth } from './normal-depth';
export { criticalDepth, criticalDepths } from './critical-depth';
export { classifySlope, type SlopeClass } from './slope-class';
export { sequentDepth } from './sequent-depth';

// Weirs and spillways: head over the crest (m) for a discharge (m³/s), and the control depth
export { weirHead, weirDischarge, type WeirSpec, type WeirHeadResult } from './weirs';
export { controlDepth } from './control-depth';

// Gradually varied flow profiles upstream of the control (distances upstream in m, levels in m above datum)
export { directStepProfile } from './profiles/direct-step';
export { standardStepProfile } from './profiles/standard-step';
export { convergedProfile, fixedResolutionProfile } from './profiles/step-refinement';
export { odeSelfCheck } from './profiles/ode-self-check';
export { profileType, type ProfileType } from './profiles/profile-type';
export { withoutSchemePrismatic, withoutSchemeSurveyed } from './profiles/without-scheme';
export { prismaticReach, surveyedReach, refinedReach, type ReachStation } from './profiles/reach-sections';
export { meanFrictionSlope, type FrictionAveraging } from './profiles/friction-averaging';
export type { GvfProfile, ProfilePoint } from './profiles/profile-point';

// Impact, inundation, flood-level limits (afflux and depths in m)
export { affluxAlong } from './impact/afflux';
export { extentOfImpact } from './impact/extent-of-impact';
export { inundation, inundationComparison } from './impact/inundation';
export { checkLimits } from './impact/flood-limits';

// Reservoir routing: a flood hydrograph through a level pool (times in s, volumes in m³, levels in m above datum)
export { routeReservoir } from './routing/route-reservoir';
export { storageCurve, type StorageSpec } from './routing/storage-curve';
export { tabulatedOutflowRating, type OutflowRating } from './routing/outflow-rating';
export { unitShapeHydrograph, NRCS_SHAPE_SOURCE } from './routing/nrcs-unit-hydrograph';
export type { RoutingResult, RoutingStep } from './routing/routing-result';

// Design: crest sizing and sensitivity
export { sizeCrest } from './design/crest-sizing';
export { sensitivity } from './design/sensitivity';

// The case file: evaluate a whole design check (SI or US customary at the edges)
export { evaluateCase } from './evaluate-case';
export { structureRating, type StructureRating, type RatingPoint } from './structure-rating';
export { caseToSI } from './case-units';
export type { CaseResult, EventResult, LimitResult } from './case-result';
export { ENGINE_VERSION } from './version';
