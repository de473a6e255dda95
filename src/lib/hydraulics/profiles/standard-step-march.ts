// One pass of the standard step method over a given list of stations.
import { sequentDepth } from '../sequent-depth';
import type { FlowSection } from '../section';
import type { CubicMetresPerSecond, Metres } from '../units';
import { aboveEveryCriticalDepth } from '../above-critical';
import { type BalanceResult, type BalanceSettings, criticalDepthOf, upstreamDepth } from './energy-balance';
import { profilePointAt } from './point-state';
import { blendPoints } from './profile-interpolation';
import type { JumpLocation, ProfilePoint, ProfileRun } from './profile-point';
import type { ProfileType } from './profile-type';
import { type ReachStation, canInterpolate, stationBetween } from './reach-sections';

export interface StandardStepPass {
  stations: readonly ReachStation[];
  controlDepth: Metres;
  settings: BalanceSettings;
  normalDepthTolerance: number;
  normalDepthAt: (station: ReachStation) => Metres | null;
  profileType: ProfileType;
  /** Depth sequent to normal flow, for locating a jump (see rememberedJumpDepths). */
  jumpDepthAt: (section: FlowSection, normalDepth: Metres) => Metres;
}

/** A jump-depth lookup that solves the momentum balance once per section. */
export function rememberedJumpDepths(discharge: CubicMetresPerSecond): (section: FlowSection, normalDepth: Metres) => Metres {
  const known = new Map<FlowSection, Map<Metres, Metres>>();
  return (section, yn) => {
    let forSection = known.get(section);
    if (forSection === undefined) known.set(section, (forSection = new Map()));
    if (!forSection.has(yn)) forSection.set(yn, sequentDepth(section, yn, discharge));
    return forSection.get(yn) as Metres;
  };
}

/** Where between two points the relative departure from normal depth falls to the tolerance. */
function normalCrossing(previousDeparture: number, departure: number, tolerance: number): number {
  // Near normal depth |y − yn| decays exponentially with distance (the GVF equation linearised about yn),
  // so the crossing is interpolated in the logarithm of the departure; linear if that does not apply.
  if (previousDeparture > tolerance && departure > 0 && departure < previousDeparture) {
    return Math.log(previousDeparture / tolerance) / Math.log(previousDeparture / departure);
  }
  return previousDeparture > departure ? (previousDeparture - tolerance) / (previousDeparture - departure) : 1;
}

type StationStop = { point: ProfilePoint; stoppedBy: 'normal-depth' | 'hydraulic-jump'; jump: JumpLocation | null } | null;

/** Normal depth below the least-energy critical depth: a steep section, where the profile ends in a jump. */
function supercriticalNormalFlow(section: FlowSection, discharge: CubicMetresPerSecond, yn: Metres): boolean {
  if (aboveEveryCriticalDepth(section, discharge, yn)) return false;
  const critical = criticalDepthOf(section, discharge);
  return critical !== null && yn < critical;
}

function stopAt(pass: StandardStepPass, previous: ProfilePoint, previousStation: ReachStation, point: ProfilePoint, station: ReachStation): StationStop {
  const yn = pass.normalDepthAt(station);
  if (yn === null) return null;
  if (supercriticalNormalFlow(station.section, pass.settings.discharge, yn)) {
    const jumpDepth = pass.jumpDepthAt(station.section, yn);
    if (point.depth > jumpDepth) return null;
    const t = previous.depth > point.depth ? (previous.depth - jumpDepth) / (previous.depth - point.depth) : 1;
    const at = blendPoints(previous, point, Math.min(1, Math.max(0, t)));
    return { point: at, stoppedBy: 'hydraulic-jump', jump: { distanceUpstream: at.distanceUpstream, upstreamDepth: yn, downstreamDepth: jumpDepth } };
  }
  const departure = Math.abs(point.depth - yn) / yn;
  if (departure > pass.normalDepthTolerance) return null;
  const previousYn = pass.normalDepthAt(previousStation) ?? yn;
  const t = normalCrossing(Math.abs(previous.depth - previousYn) / previousYn, departure, pass.normalDepthTolerance);
  return { point: blendPoints(previous, point, Math.min(1, Math.max(0, t))), stoppedBy: 'normal-depth', jump: null };
}

/** Halvings of a step whose energy balance has no subcritical level, before the profile is stopped there. */
const MAX_HALVINGS = 40;
/**
 * A step no longer than this is not halved again: a millimetre along the reach is far finer than any survey, and
 * each halving costs a section and its critical depth (several hundred per place the flow chokes, before this).
 */
const SHORTEST_HALVED_STEP: Metres = 0.001;
/** Sub-steps allowed within one gap between stations. */
const MAX_SUBSTEPS = 400;

type StepOutcome = { station: ReachStation; result: BalanceResult };

/**
 * From `from` towards `to`; where the balance has no subcritical level the step is halved (a jump or a passage
 * through critical depth lies inside it), so the profile gets as close to that place as the halvings allow.
 */
function stepTowards(from: ReachStation, depth: Metres, to: ReachStation, settings: BalanceSettings): StepOutcome {
  let station = to;
  let result = upstreamDepth(from, depth, station, settings);
  for (let halvings = 0; result.kind === 'critical-depth' && halvings < MAX_HALVINGS && station.distanceUpstream - from.distanceUpstream > SHORTEST_HALVED_STEP && canInterpolate(from, station); halvings++) {
    station = stationBetween(from, station, 0.5);
    result = upstreamDepth(from, depth, station, settings);
  }
  return { station, result };
}

export function standardStepMarch(pass: StandardStepPass): ProfileRun {
  const { stations, settings } = pass;
  const first = stations[0];
  const points: ProfilePoint[] = [profilePointAt(first.section, settings.discharge, pass.controlDepth, 0, first.bedLevel)];
  const run = (stoppedBy: ProfileRun['stoppedBy'], warnings: string[] = [], jump: JumpLocation | null = null): ProfileRun => ({ points, stoppedBy, profileType: pass.profileType, jump, warnings });
  let from = first;
  for (let i = 1; i < stations.length; i++) {
    for (let substep = 0; from !== stations[i]; substep++) {
      const previous = points[points.length - 1];
      const { station, result } = stepTowards(from, previous.depth, stations[i], settings);
      if (result.kind === 'critical-depth' || substep >= MAX_SUBSTEPS) {
        return run('critical-depth', [
          `just upstream of ${previous.distanceUpstream.toFixed(1)} m the energy balance has no subcritical level (the water would have to fall below critical depth` +
            `${result.kind === 'critical-depth' ? ` ${result.criticalDepth.toFixed(3)} m` : ''}); the profile stops there`,
        ]);
      }
      if (result.kind === 'section-overtopped') {
        return run('section-overtopped', [`at ${station.distanceUpstream.toFixed(1)} m the water would rise above the top of the section; the profile stops at ${previous.distanceUpstream.toFixed(1)} m`]);
      }
      const point = profilePointAt(station.section, settings.discharge, result.depth, station.distanceUpstream, station.bedLevel);
      const stop = stopAt(pass, previous, from, point, station);
      if (stop !== null) {
        points.push(stop.point);
        const warnings = stop.jump === null ? [] : [`a hydraulic jump forms ${stop.jump.distanceUpstream.toFixed(1)} m upstream of the control; upstream of it the flow is supercritical at normal depth`];
        return run(stop.stoppedBy, warnings, stop.jump);
      }
      points.push(point);
      from = station;
    }
  }
  return run('reach-end');
}
