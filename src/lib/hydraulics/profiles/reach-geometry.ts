// Reach-wide facts used by the standard step: mean bed slope, whether it is prismatic, normal depth by station.
import { EngineError } from '../errors';
import { normalDepth } from '../normal-depth';
import type { CubicMetresPerSecond, Metres, Slope } from '../units';
import type { ReachStation } from './reach-sections';

/** Fall of the bed per metre from the upstream end to the control (positive when the bed falls with the flow). */
export function meanBedSlope(reach: readonly ReachStation[]): Slope {
  const first = reach[0];
  const last = reach[reach.length - 1];
  return (last.bedLevel - first.bedLevel) / (last.distanceUpstream - first.distanceUpstream);
}

/** One section throughout and a bed of constant slope: a prismatic reach, where the direct step also applies. */
export function isPrismaticReach(reach: readonly ReachStation[]): boolean {
  const slope = meanBedSlope(reach);
  const first = reach[0];
  return reach.every((station) => {
    const expectedBed = first.bedLevel + slope * (station.distanceUpstream - first.distanceUpstream);
    return station.section === first.section && Math.abs(station.bedLevel - expectedBed) <= 1e-9 * Math.max(1, Math.abs(expectedBed));
  });
}

/**
 * Normal depth at each station for the reach's mean bed slope (null on a flat or adverse reach, or where the
 * section cannot carry the flow uniformly). Used to stop a surveyed-reach profile once it is back to normal flow.
 */
export function meanSlopeNormalDepths(reach: readonly ReachStation[], discharge: CubicMetresPerSecond): (station: ReachStation) => Metres | null {
  const slope = meanBedSlope(reach);
  const cache = new Map<ReachStation['section'], Metres | null>();
  return (station) => {
    if (!(slope > 0)) return null;
    if (!cache.has(station.section)) {
      try {
        cache.set(station.section, normalDepth(station.section, discharge, slope));
      } catch (error) {
        if (!(error instanceof EngineError)) throw error;
        cache.set(station.section, null);
      }
    }
    return cache.get(station.section) ?? null;
  };
}
