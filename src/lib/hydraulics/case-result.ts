// The result of evaluating a case file. Distances are measured upstream from the control section.
import type { ExtentOfImpact } from './impact/extent-of-impact';
import type { LimitCheck } from './impact/flood-limits';
import type { InundationComparison } from './impact/inundation';
import type { CrestSizingResult } from './design/crest-sizing';
import type { Robustness } from './design/robustness';
import type { SensitivityPercentages, SensitivityReport } from './design/sensitivity';
import type { ProfilePoint, ProfileStop, RefinementReport, SelfCheckReport } from './profiles/profile-point';
import type { ProfileType } from './profiles/profile-type';
import type { RoutingResult } from './routing/routing-result';
import type { SlopeClass } from './slope-class';
import type { CubicMetresPerSecond, Metres } from './units';
import type { CoefficientForm, SubmergenceState, ValidityCheck, WeirKind } from './weirs';

export type Verdict = 'pass' | 'fail';

export interface WeirDetails {
  kind: WeirKind;
  sillHeight: Metres;
  head: Metres;
  energyHead: Metres;
  approachVelocity: number;
  coefficient: number;
  coefficientSource: string;
  coefficientIsDefault: boolean;
  /** The equation the coefficient belongs to and its unit (the unit in the case's own units in a US result). */
  coefficientForm: CoefficientForm;
  /** Depth of the water downstream above the bed that the structure was rated against; null in free flow. */
  tailwaterDepth: Metres | null;
  submergence: SubmergenceState | null;
  validity: ValidityCheck[];
  /** Ogee only: the design head the coefficient was read at. */
  designHead: Metres | null;
}

export interface ControlResult {
  type: 'depth' | 'weir';
  /** Head over the crest; 0 for a depth control, which has no crest. */
  head: Metres;
  /** Depth above the channel bed at the control that the with-scheme profile starts from. */
  depth: Metres;
  /** Water level at the control (bed level + depth). */
  level: Metres;
  /** Depth the structure itself holds (sill + head), before any drowning by the downstream level. */
  structureDepth: Metres;
  controls: boolean;
  causesBackwater: boolean;
  explanation: string | null;
  weir: WeirDetails | null;
}

export interface WithoutSchemeResult {
  /** How the without-scheme downstream level was set. */
  controlBy: 'normal-depth' | 'existing-control';
  controlDepth: Metres;
  controlLevel: Metres;
  profileType: ProfileType;
  profile: ProfilePoint[];
}

/** One flood-level limit as the case result reports it (see impact/flood-limits.ts). */
export type LimitResult = LimitCheck;

export interface EventResult {
  name: string;
  /** Design discharge: the event's discharge with its climate-change allowance applied. */
  discharge: CubicMetresPerSecond;
  baseDischarge: CubicMetresPerSecond;
  climateChangeAllowance: number | null;
  annualExceedanceProbability: number | null;
  returnPeriod: number | null;
  /**
   * Normal depth at the control section. A horizontal or adverse bed has none: then `normalDepthExists` is
   * false, `normalDepth` is 0 and means "none", and the without-scheme level comes from `existingControl`.
   */
  normalDepth: Metres;
  normalDepthExists: boolean;
  criticalDepth: Metres;
  /** Bed slope the classification used: the prismatic slope, or the mean slope of a surveyed reach. */
  bedSlope: number;
  slopeClass: SlopeClass;
  profileType: ProfileType;
  control: ControlResult;
  profile: ProfilePoint[];
  stoppedBy: ProfileStop;
  refinement: RefinementReport;
  selfCheck: SelfCheckReport | null;
  withoutScheme: WithoutSchemeResult;
  /** Afflux at the control, its largest rise and its deepest drawdown (≤ 0; negative afflux). */
  afflux: { atControl: Metres; max: Metres; min: Metres };
  extent: ExtentOfImpact;
  jump: { distanceUpstream: Metres; upstreamDepth: Metres; downstreamDepth: Metres } | null;
  /**
   * The flood routed through the reservoir; null for an event checked at its steady peak discharge. Results stored
   * before routing existed lack the field: read undefined as null.
   */
  routing: RoutingResult | null;
  /** Null when the case gives no bank height or bank levels to check against. */
  inundation: InundationComparison | null;
  limits: LimitResult[];
  /** Least limit margin of the event; null without limits. */
  leastMargin: Metres | null;
  verdict: Verdict;
  warnings: string[];
}

export interface CaseResult {
  engineVersion: string;
  title: string;
  units: 'SI' | 'US';
  verdict: Verdict;
  warnings: string[];
  events: EventResult[];
  /** The event with the least limit margin; null without limits. */
  governingEvent: { index: number; name: string; leastMargin: Metres } | null;
  sizing:
    | (CrestSizingResult & {
        vary: 'sillHeight' | 'crestLength';
        lower: Metres;
        upper: Metres;
        /** The range searched and why it ends there, in words. */
        searchedRange: string;
        /** Sized so that every sensitivity run passes too. */
        robust: boolean;
        /** The limit and event with the least margin at the sized value. */
        governing: { margin: Metres; event: string; limit: string } | null;
      })
    | null;
  /** Whether the pass holds with the minimum margin and under every sensitivity run. */
  robustness: Robustness;
  sensitivity: (SensitivityReport & { event: string; percentages: SensitivityPercentages }) | null;
}
