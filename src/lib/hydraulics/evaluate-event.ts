// One flood event through the case: flow regime, control, profiles with and without the scheme, impact, limits.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ControlAdjustments } from './case-control';
import type { ReachModel } from './case-reach';
import type { ControlResult, EventResult, WithoutSchemeResult } from './case-result';
import { channelDepths } from './channel-depths';
import { withSchemeProfile, withoutSchemeLevels } from './event-profiles';
import { type HeldControl, heldControl } from './event-control';
import { eventImpact } from './event-impact';
import { routedHeldControl } from './event-routed-control';
import { type RoutingFactors, routeCaseEvent } from './routing/event-routing';
import type { GvfProfile, ProfilePoint } from './profiles/profile-point';
import type { WithoutScheme } from './profiles/without-scheme';
import { profileType } from './profiles/profile-type';
import { classifySlope } from './slope-class';
import type { Metres } from './units';

export interface EventContext {
  input: CaseInput;
  model: ReachModel;
  adjust: ControlAdjustments;
  dischargeFactor: number;
  skipSelfCheck: boolean;
  /** Storage and hydrograph-volume factors of a sensitivity run (default 1). */
  routingFactors?: RoutingFactors;
}

type CaseEvent = CaseInput['events'][number];

const m = (x: Metres) => `${x.toFixed(3)} m`;

/** Normal flow along the reach as a profile: nothing to step, nothing to refine. */
function uniformFlowProfile(points: ProfilePoint[], type: GvfProfile['profileType']): GvfProfile {
  return { points, stoppedBy: 'reach-end', profileType: type, jump: null, refinement: { stepsUsed: 0, extentChangeOnHalving: 0, converged: true }, selfCheck: null, warnings: [] };
}

/**
 * The stop tolerance that also locates the extent of impact. Stopping within t·yn of normal depth leaves an afflux
 * of up to t·yn there; when that exceeds the impact threshold the extent would lie beyond the profile, so the march
 * goes on until the afflux is at most half the threshold.
 */
function profileSettingsLocatingImpact(input: CaseInput, yn: Metres | null, warnings: string[]): CaseInput['profile'] {
  const tolerance = input.profile.normalDepthTolerance;
  const threshold = input.impactThreshold ?? 0.01;
  if (yn === null || tolerance * yn <= threshold / 2) return input.profile;
  const locating = threshold / 2 / yn;
  warnings.push(`The profile was continued past the ${(tolerance * 100).toFixed(2)} % normal-depth tolerance to ${(locating * 100).toFixed(3)} %, until the afflux is below half the ${(threshold * 1000).toFixed(0)} mm impact threshold, so that the extent of impact is located.`);
  return { ...input.profile, normalDepthTolerance: locating };
}

/**
 * What the control does in words. A given depth is a boundary condition: above the level without the scheme it heads
 * the water up, below it the water is drawn down towards it (M2 on a mild bed; Chow, Open-Channel Hydraulics, 1959,
 * §9-3 — from memory). Only a structure can fail to control.
 */
function controlExplanation(input: CaseInput, held: HeldControl, withoutDepth: Metres): string | null {
  if (!held.controls) return held.explanation;
  if (input.control.type === 'depth' && held.startDepth < withoutDepth) {
    return `The given depth at the control (${m(held.startDepth)}) is below the level without the scheme (${m(withoutDepth)} deep): the water is drawn down upstream of it, shown as negative afflux.`;
  }
  if (held.startDepth <= withoutDepth) return held.explanation;
  return null;
}

/** Evaluates one event in SI units. */
export function evaluateEvent(event: CaseEvent, index: number, ctx: EventContext): EventResult {
  const { model, input } = ctx;
  const allowance = event.climateChangeAllowance ?? 0;
  const dischargeScale = (1 + allowance / 100) * ctx.dischargeFactor;
  const routed = routeCaseEvent(event, index, { input, model, adjust: ctx.adjust, dischargeScale, factors: ctx.routingFactors ?? { storage: 1, hydrographVolume: 1 }, skipSelfCheck: ctx.skipSelfCheck });
  const routing = routed?.result ?? null;
  // A routed event's backwater carries the peak inflow (conservative), from the peak reservoir level.
  const discharge = routing ? routing.inflowPeak.discharge : event.discharge * dischargeScale;
  const section = model.controlSection;
  const depths = channelDepths(input, model, discharge, `events[${index}].discharge`);
  const { critical: yc, normal: yn, without } = depths;
  const slopeClass = classifySlope(model.bedSlope, yn, yc);
  const warnings: string[] = [];
  if (yn === null) warnings.push(`The bed is ${slopeClass}: uniform flow cannot exist, so normalDepth is reported as 0, meaning none.`);

  const held = routing ? routedHeldControl(input, model, ctx.adjust, routing, depths) : heldControl(input, section, discharge, ctx.adjust, without.depth, yc, yn);
  if (routed) warnings.push(...routed.warnings);
  warnings.push(...held.warnings);
  const { structure, startDepth } = held;
  const explanation = controlExplanation(input, held, without.depth);
  if (explanation) warnings.push(explanation);
  const bankAtControl = model.bankLevelAt?.(0);
  if (held.controls && bankAtControl !== undefined && model.bedLevelAtControl + startDepth > bankAtControl) {
    warnings.push(`The level at the structure (${m(model.bedLevelAtControl + startDepth)}) is above the bank there (${m(bankAtControl)}): the structure itself floods the banks.`);
  }

  let levels: WithoutScheme;
  let profile: GvfProfile;
  if (!held.controls) {
    // The same depth at the control as without the scheme: the with-scheme profile is the without-scheme one.
    levels = withoutSchemeLevels(model, input.profile, discharge, input.existingControl?.depth, [0, model.length]);
    profile = levels.profile ?? uniformFlowProfile(levels.points, profileType(slopeClass, without.depth, yn, yc));
  } else {
    const settings = profileSettingsLocatingImpact(input, yn, warnings);
    profile = withSchemeProfile(model, settings, discharge, startDepth, ctx.skipSelfCheck);
    const distances = [...profile.points.map((p) => p.distanceUpstream), model.length];
    levels = withoutSchemeLevels(model, input.profile, discharge, input.existingControl?.depth, distances);
  }
  warnings.push(...profile.warnings);
  if (levels.profile && levels.profile !== profile) warnings.push(...levels.profile.warnings.map((w) => `Without the scheme: ${w}`));
  const impact = eventImpact(input, model, profile, levels, warnings, routing && input.reservoir?.length !== undefined ? { length: input.reservoir.length, peakLevel: routing.peakLevel.level } : null);

  const control: ControlResult = {
    type: input.control.type,
    head: structure.head,
    depth: startDepth,
    level: model.bedLevelAtControl + startDepth,
    structureDepth: structure.depth,
    controls: held.controls,
    causesBackwater: held.controls && startDepth > without.depth,
    explanation,
    weir: structure.weir,
  };
  return {
    name: event.name,
    discharge,
    baseDischarge: event.discharge,
    climateChangeAllowance: event.climateChangeAllowance ?? null,
    annualExceedanceProbability: event.annualExceedanceProbability ?? null,
    returnPeriod: event.returnPeriod ?? null,
    normalDepth: yn ?? 0,
    normalDepthExists: yn !== null,
    criticalDepth: yc,
    bedSlope: model.bedSlope,
    slopeClass,
    profileType: profile.profileType,
    control,
    profile: profile.points,
    stoppedBy: profile.stoppedBy,
    refinement: profile.refinement,
    selfCheck: profile.selfCheck,
    withoutScheme: {
      controlBy: without.by,
      controlDepth: without.depth,
      controlLevel: model.bedLevelAtControl + without.depth,
      profileType: levels.profile?.profileType ?? profileType(slopeClass, without.depth, yn, yc),
      profile: levels.points,
    },
    ...impact,
    jump: profile.jump,
    routing,
    warnings,
  };
}
