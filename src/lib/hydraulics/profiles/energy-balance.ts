// One standard step: the water level at the next section upstream from the energy balance between the two.
import { aboveEveryCriticalDepth } from '../above-critical';
import { criticalDepth } from '../critical-depth';
import { DEEPEST_OPEN_DEPTH } from '../depth-brackets';
import { EngineError } from '../errors';
import type { FlowSection } from '../section';
import { type SectionSample, emptySample, sampleSection } from '../section-sample';
import { requireDepth } from '../section-state';
import { brentRoot, expandBracketUpward, rememberingRecent } from '../solvers';
import type { CubicMetresPerSecond, Metres } from '../units';
import { GRAVITY } from '../units';
import { type FrictionAveraging, meanFrictionSlope } from './friction-averaging';
import type { ReachStation } from './reach-sections';

export interface BalanceSettings {
  discharge: CubicMetresPerSecond;
  frictionAveraging: FrictionAveraging;
  expansionCoefficient: number;
  contractionCoefficient: number;
}

export type BalanceResult = { kind: 'level'; depth: Metres } | { kind: 'critical-depth'; criticalDepth: Metres } | { kind: 'section-overtopped' };

/** αV²/2g with V = Q/A (Chow, Open-Channel Hydraulics, 1959, §2-7 — from memory). */
function velocityHead(state: Pick<SectionSample, 'energyCoefficient' | 'area'>, discharge: CubicMetresPerSecond): Metres {
  return (state.energyCoefficient * discharge * discharge) / (2 * GRAVITY * state.area * state.area);
}

/**
 * Residual of WS₂ + α₂V₂²/2g = WS₁ + α₁V₁²/2g + hf + he as a function of the upstream depth, where 1 is the
 * known section downstream and 2 the one upstream (Chow, Open-Channel Hydraulics, 1959, §10-4, standard step
 * method): hf = L·S̄f and he = C·|α₂V₂²/2g − α₁V₁²/2g|. Going downstream from 2 to 1, a falling velocity head
 * (h_v1 < h_v2) is an expansion, a rising one a contraction (coefficients 0.3 and 0.1 by default for gradual
 * transitions: common practice). Negative while the upstream level is too low, positive when too high.
 */
function balanceResidual(down: ReachStation, downDepth: Metres, up: ReachStation, settings: BalanceSettings): (depth: Metres) => number {
  const { discharge } = settings;
  requireDepth(downDepth);
  const downState = sampleSection(down.section, downDepth, emptySample());
  const downHead = velocityHead(downState, discharge);
  const downEnergy = down.bedLevel + downDepth + downHead;
  const length = up.distanceUpstream - down.distanceUpstream;
  // One reused record per balance: Brent asks for a dozen depths, and a full state per depth is garbage at once.
  const sample = emptySample();
  return (depth) => {
    requireDepth(depth);
    const state = sampleSection(up.section, depth, sample);
    const upHead = velocityHead(state, discharge);
    const friction = length * meanFrictionSlope(settings.frictionAveraging, discharge, downState.conveyance, state.conveyance);
    const coefficient = downHead < upHead ? settings.expansionCoefficient : settings.contractionCoefficient;
    return up.bedLevel + depth + upHead - downEnergy - friction - coefficient * Math.abs(upHead - downHead);
  };
}

/** Null when critical depth lies above the top of the section (criticalDepth remembers it per section and discharge). */
export function criticalDepthOf(section: FlowSection, discharge: CubicMetresPerSecond): Metres | null {
  try {
    return criticalDepth(section, discharge);
  } catch (error) {
    if (error instanceof EngineError && error.code === 'section-overtopped') return null;
    throw error;
  }
}

/** How far above the downstream level the first try at the upstream level lies; the bracket then grows from there. */
const FIRST_RISE: Metres = 0.05;

/**
 * The balance found without the upstream section's critical depth, when the downstream water level carried across is
 * too low and proven to lie above every critical depth there: the level that balances lies higher still, on the
 * subcritical branch. Null when that does not hold (the flow speeding up, near critical, a berm flooding just above).
 * Why: most steps of a surveyed reach land on a section not met before, and its critical depths cost several times the
 * balance itself.
 */
function balanceAboveCritical(down: ReachStation, downDepth: Metres, up: ReachStation, residual: (depth: Metres) => number, discharge: CubicMetresPerSecond): BalanceResult | null {
  const carried = down.bedLevel + downDepth - up.bedLevel;
  const top = up.section.maxDepth;
  if (!(carried > 0) || !(carried < top) || !(residual(carried) < 0) || !aboveEveryCriticalDepth(up.section, discharge, carried)) return null;
  const bracket = expandBracketUpward(residual, carried, Math.min(carried + FIRST_RISE, top), { maxHi: top, field: 'profile' });
  if (bracket === null) return { kind: 'section-overtopped' };
  return { kind: 'level', depth: brentRoot(residual, bracket[0], bracket[1], { tolerance: 1e-11 * bracket[1], field: 'profile' }) };
}

/**
 * The subcritical depth at `up` that balances the energy with `down`, searched by Brent's method on a bracket
 * from critical depth upwards (never a bare fixed-point iteration), or from the downstream level carried across where
 * that is proven subcritical. If even critical depth at `up` has too much energy, there is no subcritical level: the
 * profile would have to pass through critical depth.
 */
export function upstreamDepth(down: ReachStation, downDepth: Metres, up: ReachStation, settings: BalanceSettings): BalanceResult {
  const residual = rememberingRecent(balanceResidual(down, downDepth, up, settings));
  const found = balanceAboveCritical(down, downDepth, up, residual, settings.discharge);
  if (found !== null) return found;
  const critical = criticalDepthOf(up.section, settings.discharge);
  if (critical === null) return { kind: 'section-overtopped' };
  if (residual(critical) >= 0) return { kind: 'critical-depth', criticalDepth: critical };
  const top = Number.isFinite(up.section.maxDepth) ? up.section.maxDepth : DEEPEST_OPEN_DEPTH;
  const guess = Math.min(Math.max(down.bedLevel + downDepth - up.bedLevel, critical) + Math.max(critical, 0.1), top);
  const bracket = guess > critical ? expandBracketUpward(residual, critical, guess, { maxHi: top, field: 'profile' }) : null;
  if (bracket === null) return { kind: 'section-overtopped' };
  const depth = brentRoot(residual, bracket[0], bracket[1], { tolerance: 1e-11 * bracket[1], field: 'profile' });
  return { kind: 'level', depth };
}
