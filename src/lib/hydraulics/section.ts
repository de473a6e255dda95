import type { FroudeFactorBounds, SectionSample } from './section-sample';
import type { CubicMetres, CubicMetresPerSecond, Dimensionless, Metres, SquareMetres } from './units';

/** Hydraulic properties of one cross-section at one water depth (SI). */
export interface SectionState {
  /** Depth above the lowest point of the section, m. */
  depth: Metres;
  area: SquareMetres;
  /** Wetted perimeter, m (vertical sub-area divisions not counted). */
  wettedPerimeter: Metres;
  topWidth: Metres;
  /** R = A / P, m. */
  hydraulicRadius: Metres;
  /** D = A / T, m: the depth that belongs in the Froude number. */
  hydraulicDepth: Metres;
  /** First moment of the wetted area about the free surface, A·ȳ, m³ (for the momentum function). */
  firstMoment: CubicMetres;
  /** Conveyance K = Σ (1/nᵢ) Aᵢ Rᵢ^(2/3), m³/s, so that Q = K √Sf. */
  conveyance: CubicMetresPerSecond;
  /** Energy (Coriolis) coefficient α. */
  energyCoefficient: Dimensionless;
  /** True when the water is above the lower of the two ends of a surveyed section or above a closed conduit's soffit. */
  overtopped: boolean;
}

/**
 * One cross-section with its roughness: everything uniform-flow, critical-flow and profile
 * calculations need. Prismatic shapes and surveyed sections both implement it.
 */
export interface FlowSection {
  readonly shape: 'rectangular' | 'trapezoidal' | 'triangular' | 'circular' | 'surveyed';
  /** Level of the lowest point of the section (m above datum); 0 for a prismatic shape on its own. */
  readonly invertLevel: Metres;
  /** Deepest depth the section can represent (Infinity for open prismatic shapes; the diameter of a circle; the lower end of a surveyed section). */
  readonly maxDepth: Metres;
  stateAtDepth(depth: Metres): SectionState;
  /** The same area, top width, conveyance and α as stateAtDepth, written into `out` (optional; see section-sample.ts). */
  sampleInto?(depth: Metres, out: SectionSample): void;
  /** Bounds on αT/A³ holding at every depth in [from, to] (optional; lets the critical-depth scan skip stretches). */
  froudeFactorBoundsInto?(from: Metres, to: Metres, out: FroudeFactorBounds): void;
}
