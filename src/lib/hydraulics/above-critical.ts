// Whether a depth lies above every critical depth of a section, proven without finding them.
import type { FlowSection } from './section';
import type { FroudeFactorBounds } from './section-sample';
import type { CubicMetresPerSecond, Metres } from './units';
import { GRAVITY } from './units';

/** Relative margin by which a bound must clear 1 to prove a sign: far above the rounding of either side. */
export const FROUDE_PROOF_MARGIN = 1e-9;

/**
 * Proofs over a stretch of depths that may fail before the question is left open. Why: each costs about two
 * evaluations of the section, and a full critical-depth search some thirty; near critical flow, or where a berm
 * floods just above, a proof rarely succeeds, and the caller then finds the critical depths after all.
 */
const MOST_FAILED_PROOFS = 4;

const bounds: FroudeFactorBounds = { least: 0, most: Infinity };

/**
 * True when Fr² = αQ²T/(gA³) < 1 is proven at every depth from `depth` to the top of the section (Chow, Open-Channel
 * Hydraulics, 1959, §4-2 criterion — from memory), from the section's bounds on αT/A³ over stretches of depths: then
 * every critical depth, and so the one of least specific energy, lies below `depth`. False when that is not proven
 * (a section without such bounds, or an open top), which says nothing either way.
 */
export function aboveEveryCriticalDepth(section: FlowSection, discharge: CubicMetresPerSecond, depth: Metres): boolean {
  const top = section.maxDepth;
  if (section.froudeFactorBoundsInto === undefined || !Number.isFinite(top) || !(depth > 0) || !(depth < top)) return false;
  const scale = (discharge * discharge) / GRAVITY;
  let from = depth;
  let span = top - depth;
  for (let failures = 0; from < top; ) {
    const to = Math.min(top, from + span);
    section.froudeFactorBoundsInto(from, to, bounds);
    if (scale * bounds.most < 1 - FROUDE_PROOF_MARGIN) {
      from = to;
      span *= 2;
    } else if (++failures > MOST_FAILED_PROOFS) return false;
    else span /= 2;
  }
  return true;
}
