// Small helpers shared by the engine tests (not engine code, not reference solutions).
import { EngineError } from '@/lib/hydraulics/errors';
import type { ProfilePoint } from '@/lib/hydraulics/profiles/profile-point';

/** The EngineError an action throws; any other outcome fails the test. */
export function caught(action: () => unknown): EngineError {
  try {
    action();
  } catch (error) {
    if (error instanceof EngineError) return error;
    throw error;
  }
  throw new Error('expected an EngineError');
}

/** A bare profile point for hand-made profiles (only distance and level matter to the impact functions). */
export const at = (distanceUpstream: number, waterLevel: number): ProfilePoint => ({
  distanceUpstream,
  depth: 1,
  waterLevel,
  bedLevel: waterLevel - 1,
  velocity: 1,
  froude: 0.3,
  frictionSlope: 0.001,
  energyLevel: waterLevel + 0.05,
});
