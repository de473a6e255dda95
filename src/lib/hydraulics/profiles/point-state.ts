// A profile point from a depth at a place: the flow properties the profile reports.
import { flowVelocity, froudeNumber, frictionSlope, specificEnergy } from '../flow-properties';
import type { FlowSection } from '../section';
import type { CubicMetresPerSecond, Metres } from '../units';
import type { ProfilePoint } from './profile-point';

export function profilePointAt(
  section: FlowSection,
  discharge: CubicMetresPerSecond,
  depth: Metres,
  distanceUpstream: Metres,
  bedLevel: Metres,
): ProfilePoint {
  const waterLevel = bedLevel + depth;
  return {
    distanceUpstream,
    depth,
    waterLevel,
    bedLevel,
    velocity: flowVelocity(section, depth, discharge),
    froude: froudeNumber(section, depth, discharge),
    frictionSlope: frictionSlope(section, depth, discharge),
    // Energy level = bed level + specific energy y + αV²/2g (Chow, Open-Channel Hydraulics, 1959, §3-1 — from memory).
    energyLevel: bedLevel + specificEnergy(section, depth, discharge),
  };
}
