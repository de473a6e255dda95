// A profile point from a depth at a place: the flow properties the profile reports.
import { InvalidInputError } from '../errors';
import { wettedState } from '../flow-properties';
import type { FlowSection } from '../section';
import { emptySample, sampleSection } from '../section-sample';
import type { CubicMetresPerSecond, Metres } from '../units';
import { GRAVITY } from '../units';
import type { ProfilePoint } from './profile-point';

const sample = emptySample();

/**
 * One section sample gives every reported property, by the formulas of flow-properties.ts: V = Q/A (continuity),
 * Fr = V √(αT/(gA)) (Chow, Open-Channel Hydraulics, 1959, §3-3), Sf = (Q/K)² (Chow 1959, §10-1) and the
 * specific energy y + αV²/2g (Chow 1959, §3-2) — section numbers from memory.
 */
export function profilePointAt(
  section: FlowSection,
  discharge: CubicMetresPerSecond,
  depth: Metres,
  distanceUpstream: Metres,
  bedLevel: Metres,
): ProfilePoint {
  // The usual checks (and their messages) apply only when something is wrong: a march reports thousands of points.
  if (!(depth > 0) || !Number.isFinite(depth) || !(discharge >= 0) || !Number.isFinite(discharge)) wettedState(section, depth, discharge);
  const state = sampleSection(section, depth, sample);
  if (!(state.area > 0) || !(state.conveyance > 0)) wettedState(section, depth, discharge);
  const velocity = discharge / state.area;
  const froude = velocity * Math.sqrt((state.energyCoefficient * state.topWidth) / (GRAVITY * state.area));
  const frictionSlope = (discharge / state.conveyance) ** 2;
  const specificEnergy = depth + (state.energyCoefficient * velocity * velocity) / (2 * GRAVITY);
  if (![velocity, froude, frictionSlope, specificEnergy].every(Number.isFinite)) {
    throw new InvalidInputError('discharge', 'is out of range for this section (the result overflows)');
  }
  const waterLevel = bedLevel + depth;
  return {
    distanceUpstream,
    depth,
    waterLevel,
    bedLevel,
    velocity,
    froude,
    frictionSlope,
    // Energy level = bed level + specific energy y + αV²/2g (Chow, Open-Channel Hydraulics, 1959, §3-1 — from memory).
    energyLevel: bedLevel + specificEnergy,
  };
}
