// What the engine reports for a flood event routed through a reservoir's storage (level-pool routing).
// The results sheet, the calculation sheet and the certificate read these fields; the engine fills them.
import type { CubicMetres, CubicMetresPerSecond, Metres, SquareMetres } from '../units';

/** Time in seconds from the start of the inflow hydrograph (the case file gives hours; the engine works in seconds). */
export type Seconds = number;

/** One row of the routing table. */
export interface RoutingStep {
  time: Seconds;
  inflow: CubicMetresPerSecond;
  outflow: CubicMetresPerSecond;
  /** Reservoir level above the datum. */
  level: Metres;
  /** Storage above the level at the start of the flood. */
  storage: CubicMetres;
}

/** How the inflow hydrograph was given, in words the sheets can print. */
export interface HydrographSummary {
  kind: 'table' | 'unit-shape';
  /** For a unit shape: the published dimensionless hydrograph and its source; null for a table. */
  shapeSource: string | null;
  points: number;
  duration: Seconds;
  peakInflow: CubicMetresPerSecond;
  timeToPeak: Seconds;
  volume: CubicMetres;
}

/** How the storage was given, in words the sheets can print. */
export interface StorageSummary {
  kind: 'level-area' | 'level-volume' | 'constant-area';
  rows: number;
  /** Level range the table covers above the datum; null for a constant area. */
  lowestLevel: Metres | null;
  highestLevel: Metres | null;
  /** Surface area at the start level. */
  areaAtStart: SquareMetres;
  startLevel: Metres;
  /** Length of the reservoir along the valley from the structure; limits within it are checked against the peak level. Null when not given. */
  reservoirLength: Metres | null;
}

export interface RoutingRefinement {
  timeStep: Seconds;
  /** Times the step was halved until the peak level changed by less than the tolerance. */
  halvings: number;
  peakLevelChangeOnHalving: Metres;
  tolerance: Metres;
  converged: boolean;
}

/** The independent integration of dS/dt = I − O(h) (odex), reported like the profile self-check. */
export interface RoutingSelfCheck {
  method: string;
  peakLevel: Metres;
  /** |modified Puls peak level − independent peak level|. */
  peakLevelDifference: Metres;
  peakOutflowDifference: CubicMetresPerSecond;
}

export interface VolumeBalance {
  inflow: CubicMetres;
  outflow: CubicMetres;
  storageChange: CubicMetres;
  /** inflow − outflow − storageChange: closes to round-off. */
  residual: CubicMetres;
}

export interface RoutingResult {
  method: 'modified-puls';
  /** The published source of the method, for the sheets. */
  methodSource: string;
  hydrograph: HydrographSummary;
  storage: StorageSummary;
  refinement: RoutingRefinement;
  selfCheck: RoutingSelfCheck | null;
  inflowPeak: { time: Seconds; discharge: CubicMetresPerSecond };
  outflowPeak: { time: Seconds; discharge: CubicMetresPerSecond };
  /** Peak inflow − peak outflow. */
  attenuation: CubicMetresPerSecond;
  /** Time of peak outflow − time of peak inflow. */
  lag: Seconds;
  peakLevel: { time: Seconds; level: Metres };
  volumeBalance: VolumeBalance;
  /** The routing table at the converged time step, thinned to at most ROUTING_TABLE_ROWS rows (peaks, first and last kept). */
  steps: RoutingStep[];
  /** Assumptions stated on every sheet, in words (e.g. the backwater upstream carries the peak inflow from the peak level). */
  assumptions: string[];
}
