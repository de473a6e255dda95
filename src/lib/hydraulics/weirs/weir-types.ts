import type { SubmergenceRelation } from './submergence';
import type { CubicMetresPerSecond, Metres, MetresPerSecond } from '../units';

export type WeirKind = 'sharp-crested' | 'broad-crested' | 'ogee' | 'rating-table';

export interface WeirSpec {
  kind: WeirKind;
  /** Crest length across the flow, m (gross length between abutments for an ogee). */
  crestLength: Metres;
  /** Height of the crest above the channel bed at the weir, m. */
  sillHeight: Metres;
  /** A coefficient given by the user replaces the published one (same form as the kind's own equation). */
  coefficient?: number;
  coefficientReason?: string;
  /** Add the approach-velocity head to the measured head (default true). */
  approachVelocity?: boolean;
  /** Broad-crested: breadth of the crest in the flow direction, m. */
  crestBreadth?: Metres;
  noseShape?: 'square-edged' | 'round-nosed';
  /** Sharp-crested: width of the approach channel, m; giving it selects Kindsvater–Carter. */
  channelWidth?: Metres;
  /** Ogee: design energy head, m; default the head at the governing discharge. */
  designHead?: Metres;
  piers?: { count: number; coefficient?: number };
  abutmentCoefficient?: number;
  /**
   * Depth of the water just downstream of the structure above the channel bed there, m (measured like the sill
   * height). Omitted, the structure is rated in free flow.
   */
  tailwaterDepth?: Metres;
  /**
   * Scales the coefficient (and so the discharge at a head) of whichever rating applies; for sensitivity
   * studies. Default 1.
   */
  coefficientMultiplier?: number;
  /** [head above the crest m, discharge m³/s] pairs, both strictly increasing. */
  ratingTable?: [level: Metres, discharge: CubicMetresPerSecond][];
}

export interface ValidityCheck {
  name: string;
  value: number;
  min?: number;
  max?: number;
  ok: boolean;
}

export interface SubmergenceState {
  /** Downstream water height above the crest, m (0 when the water downstream is below the crest). */
  tailwaterHead: Metres;
  /** Downstream head over upstream head, as the relation defines it (h₂/h₁, or h₂/H₁ on a broad crest). */
  ratio: number;
  /** Reduction factor Qs/Q of the relation. */
  factor: number;
  /** The relation applied, with its source. */
  relation: string;
  /** True while the ratio is within the modular limit, so that the flow over the crest is free. */
  modular: boolean;
  /** True when the ratio is past the relation's data (see SUBMERGENCE_DATA_LIMIT). */
  extrapolated: boolean;
}

/** The published equation a coefficient belongs to, and its unit, so that Cd and C are never shown under one label. */
export interface CoefficientForm {
  /** Symbol as the equation writes it: Cd, Ce or C. */
  symbol: string;
  /** The equation, e.g. "Q = C·L·He^1.5". */
  equation: string;
  /** 'dimensionless', or the SI unit of a dimensional coefficient ('m^½/s'). */
  unit: 'dimensionless' | 'm^½/s' | 'ft^½/s' | 'none';
}

export interface WeirHeadResult {
  /** Upstream water level above the crest, m. */
  head: Metres;
  /** Head plus the approach-velocity head, m. */
  energyHead: Metres;
  approachVelocity: MetresPerSecond;
  coefficient: number;
  coefficientSource: string;
  coefficientIsDefault: boolean;
  coefficientForm: CoefficientForm;
  iterations: number;
  submergence: SubmergenceState | null;
  validity: ValidityCheck[];
  warnings: string[];
}

export interface WeirOptions {
  energyCoefficient?: number;
  /** Field-path prefix for errors, default 'control'. */
  field?: string;
}

/**
 * One structure's free-flow rating, built once per spec. `discharge` takes the measured head h and
 * the energy head H; each kind's published equation uses the one its coefficient was fitted to.
 */
export interface FreeFlowRating {
  discharge(head: Metres, energyHead: Metres): CubicMetresPerSecond;
  coefficient(head: Metres, energyHead: Metres): number;
  validity(head: Metres, energyHead: Metres): ValidityCheck[];
  /**
   * True when the equation is written in the energy head: the solver then passes h + αV₀²/2g (or h when
   * the case leaves out the approach velocity). False when the coefficient already carries the approach
   * velocity (Rehbock, Kindsvater–Carter, a measured rating table): the solver passes h for both.
   */
  usesEnergyHead: boolean;
  /** Smallest head the equation applies from (the first level of a rating table), m. */
  headFloor?: Metres;
  /** Largest head the equation may be solved up to (where it stops rising or its table ends), m. */
  headLimit?: Metres;
  coefficientSource: string;
  coefficientIsDefault: boolean;
  coefficientForm: CoefficientForm;
  /** How the discharge falls when the water downstream stands above the crest. */
  submergence: SubmergenceRelation;
  /** Notes about assumptions made while building the rating. */
  notes: string[];
}

export function check(name: string, value: number, min?: number, max?: number): ValidityCheck {
  // A ratio over a vanishing sill is unbounded; report the largest finite number rather than Infinity or NaN.
  const reported = Number.isNaN(value) ? Number.MAX_VALUE : Math.max(-Number.MAX_VALUE, Math.min(Number.MAX_VALUE, value));
  const ok = Number.isFinite(value) && (min === undefined || value >= min) && (max === undefined || value <= max);
  return { name, value: reported, ...(min !== undefined ? { min } : {}), ...(max !== undefined ? { max } : {}), ok };
}
