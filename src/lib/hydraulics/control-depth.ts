import { requireFinite, requireNonNegative, requirePositive } from './errors';
import type { Metres } from './units';

export interface ControlDepthInput {
  sillHeight: Metres;
  head: Metres;
  criticalDepth: Metres;
  /** Normal depth of the approach reach, or null on a horizontal or adverse bed, which has none. */
  normalDepth: Metres | null;
}

export interface ControlDepth {
  /** Depth of water above the channel bed at the structure, m. */
  depth: Metres;
  /** Whether the depth is above critical, so that the structure governs the flow upstream. */
  controls: boolean;
  /** Whether the structure holds the water above normal depth, so that it raises levels upstream. */
  causesBackwater: boolean;
  explanation: string | null;
}

const cm = (x: Metres) => `${x.toFixed(3)} m`;

/**
 * Depth at a weir or spillway: sill height plus head over the crest. A control acts upstream only
 * when it holds the flow above critical depth, and raises levels only when it is above normal depth
 * (Chow, Open-Channel Hydraulics (1959), ch. 9 on control sections; Henderson, Open Channel Flow (1966), ch. 6, channel controls (both from memory)).
 */
export function controlDepth(o: ControlDepthInput): ControlDepth {
  requireNonNegative(o.sillHeight, 'sillHeight');
  requireNonNegative(o.head, 'head');
  requirePositive(o.criticalDepth, 'criticalDepth');
  if (o.normalDepth !== null) requireFinite(o.normalDepth, 'normalDepth');
  const depth = o.sillHeight + o.head;
  const controls = depth > o.criticalDepth;
  if (!controls) {
    return {
      depth,
      controls,
      causesBackwater: false,
      explanation: `The structure does not control the flow: the depth over it (${cm(depth)}) does not exceed the critical depth of the channel (${cm(o.criticalDepth)}).`,
    };
  }
  if (o.normalDepth !== null && depth <= o.normalDepth) {
    return {
      depth,
      controls,
      causesBackwater: false,
      explanation: `The structure causes no backwater: the depth it holds (${cm(depth)}) does not exceed the normal depth of the reach (${cm(o.normalDepth)}).`,
    };
  }
  return { depth, controls, causesBackwater: true, explanation: null };
}
