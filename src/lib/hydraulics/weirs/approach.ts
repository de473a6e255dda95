import { InvalidInputError, NoPhysicalSolutionError } from '../errors';
import type { FlowSection } from '../section';
import { emptySample, sampleSection } from '../section-sample';
import { GRAVITY, type CubicMetresPerSecond, type Metres, type MetresPerSecond } from '../units';

const scratch = emptySample();

export interface ApproachState {
  velocity: MetresPerSecond;
  /** αV₀²/2g, m. */
  velocityHead: Metres;
  overtopped: boolean;
}

/**
 * Mean velocity and velocity head in the approach section at depth sill + head:
 * V₀ = Q / A(P + h), velocity head αV₀²/2g (Chow, Open-Channel Hydraulics (1959), ch. 2, energy coefficient α (from memory)).
 */
export function approachState(
  approach: FlowSection,
  sillHeight: Metres,
  head: Metres,
  discharge: CubicMetresPerSecond,
  energyCoefficient: number | undefined,
  field: string,
): ApproachState {
  const depth = sillHeight + head;
  // The weir head is solved by iteration on this; the area and α are all it needs of the section.
  const state = sampleSection(approach, depth, scratch);
  if (!(state.area > 0)) {
    throw new InvalidInputError(`${field}.sillHeight`, 'the approach section holds no water at the crest level; the sill must stand above the channel bed');
  }
  const velocity = discharge / state.area;
  const alpha = energyCoefficient ?? state.energyCoefficient;
  const velocityHead = (alpha * velocity ** 2) / (2 * GRAVITY);
  if (!Number.isFinite(velocityHead)) {
    throw new NoPhysicalSolutionError(field, 'approach-too-small', 'the approach section at the crest is too small to carry the flow: check the sill height and the discharge');
  }
  return { velocity, velocityHead, overtopped: depth > approach.maxDepth };
}
