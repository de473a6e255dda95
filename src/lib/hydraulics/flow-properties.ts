// Flow properties of a section at one depth and discharge (SI).
import { InvalidInputError, requireFinite, requireNonNegative } from './errors';
import type { FlowSection, SectionState } from './section';
import type { CubicMetres, CubicMetresPerSecond, Dimensionless, Metres, MetresPerSecond, Slope } from './units';
import { GRAVITY } from './units';

export interface FlowFieldNames {
  /** Path for errors about the depth, default 'depth'. */
  depthField?: string;
  /** Path for errors about the discharge, default 'discharge'. */
  dischargeField?: string;
}

/** The section's state at a positive depth with some flow area, after checking both inputs. */
export function wettedState(section: FlowSection, depth: Metres, discharge: CubicMetresPerSecond, fields: FlowFieldNames = {}): SectionState {
  const depthField = fields.depthField ?? 'depth';
  requireFinite(depth, depthField);
  if (depth <= 0) throw new InvalidInputError(depthField, 'must be greater than 0');
  requireNonNegative(discharge, fields.dischargeField ?? 'discharge');
  const state = section.stateAtDepth(depth);
  if (!(state.area > 0) || !(state.conveyance > 0)) throw new InvalidInputError(depthField, `is too small to give any flow area (${depth} m)`);
  return state;
}

/** A result that overflowed double precision means the inputs are out of any physical range. */
function finite(value: number, fields: FlowFieldNames = {}): number {
  if (!Number.isFinite(value)) throw new InvalidInputError(fields.dischargeField ?? 'discharge', 'is out of range for this section (the result overflows)');
  return value;
}

/** Mean velocity V = Q/A (continuity). */
export function flowVelocity(section: FlowSection, depth: Metres, discharge: CubicMetresPerSecond, fields?: FlowFieldNames): MetresPerSecond {
  return finite(discharge / wettedState(section, depth, discharge, fields).area, fields);
}

/**
 * Fr = √(α Q² T / (g A³)), i.e. V/√(gD/α) with the hydraulic depth D = A/T, never the flow depth
 * (Chow, Open-Channel Hydraulics, 1959, §3-3; Henderson, Open Channel Flow, 1966, ch. 2 — section numbers from memory).
 * Written with V = Q/A so that tiny areas cannot underflow into 0/0.
 */
export function froudeNumber(section: FlowSection, depth: Metres, discharge: CubicMetresPerSecond, fields?: FlowFieldNames): Dimensionless {
  const state = wettedState(section, depth, discharge, fields);
  const velocity = discharge / state.area;
  return finite(velocity * Math.sqrt((state.energyCoefficient * state.topWidth) / (GRAVITY * state.area)), fields);
}

/** E = y + α V²/(2g) with V = Q/A (Chow 1959, §3-2, specific energy — from memory). */
export function specificEnergy(section: FlowSection, depth: Metres, discharge: CubicMetresPerSecond, fields?: FlowFieldNames): Metres {
  const state = wettedState(section, depth, discharge, fields);
  const velocity = discharge / state.area;
  return finite(depth + (state.energyCoefficient * velocity * velocity) / (2 * GRAVITY), fields);
}

/** M = Q²/(g A) + A ȳ, the specific force (momentum function) per unit weight (Chow 1959, §3-7 — from memory). */
export function specificForce(section: FlowSection, depth: Metres, discharge: CubicMetresPerSecond, fields?: FlowFieldNames): CubicMetres {
  const state = wettedState(section, depth, discharge, fields);
  return finite((discharge * (discharge / state.area)) / GRAVITY + state.firstMoment, fields);
}

/** Sf = (Q/K)², Manning's formula solved for the slope of the energy line (Chow 1959, §10-1 — from memory). */
export function frictionSlope(section: FlowSection, depth: Metres, discharge: CubicMetresPerSecond, fields?: FlowFieldNames): Slope {
  const state = wettedState(section, depth, discharge, fields);
  return finite((discharge / state.conveyance) ** 2, fields);
}
