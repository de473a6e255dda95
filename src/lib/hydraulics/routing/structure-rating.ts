// The case's spillway as an outflow rating O(h): the steady check's own structure, rated over a range of discharges.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ControlAdjustments } from '../case-control';
import type { ReachModel } from '../case-reach';
import { channelDepths } from '../channel-depths';
import { InvalidInputError } from '../errors';
import { heldControl } from '../event-control';
import type { CubicMetresPerSecond, Metres } from '../units';
import { type OutflowRating, tabulatedOutflowRating } from './outflow-rating';

export interface StructureRatingInput {
  input: CaseInput;
  model: ReachModel;
  adjust: ControlAdjustments;
  /** The flood's peak inflow; the rating must reach it (the outflow of a level pool never exceeds it, unless it starts higher). */
  peakInflow: CubicMetresPerSecond;
  startLevel: Metres;
}

/** Level of the crest above the datum: the bed at the structure plus the sill. */
export function crestLevelOf(input: CaseInput, model: ReachModel, adjust: ControlAdjustments): Metres {
  if (input.control.type !== 'weir') throw new InvalidInputError('reservoir', 'needs a weir or rating-table control: a fixed depth at the control has no rating to pass the outflow through');
  return model.bedLevelAtControl + (adjust.sillHeight ?? input.control.sillHeight);
}

/**
 * The level upstream of the structure passing `discharge` exactly as the steady check finds it: rated against the case's
 * tailwater depth, or the channel's own level below it, with the approach velocity as entered.
 */
function levelPassing(r: StructureRatingInput, discharge: CubicMetresPerSecond): Metres {
  const depths = channelDepths(r.input, r.model, discharge, 'reservoir');
  const held = heldControl(r.input, r.model.controlSection, discharge, r.adjust, depths.without.depth, depths.critical, depths.normal);
  return r.model.bedLevelAtControl + held.startDepth;
}

export function structureRating(r: StructureRatingInput): OutflowRating {
  const control = r.input.control;
  const crestLevel = crestLevelOf(r.input, r.model, r.adjust);
  let needed = r.peakInflow;
  // A reservoir starting above the crest first passes more than it receives: rate it up to that outflow too.
  for (let i = 0; i < 60 && levelPassing(r, needed) < r.startLevel; i++) needed *= 2;
  let maxDischarge = 1.1 * needed;
  let minDischarge: number | undefined;
  if (control.type === 'weir' && control.kind === 'rating-table' && control.ratingTable) {
    const multiplier = r.adjust.coefficientMultiplier ?? 1;
    const table = control.ratingTable;
    minDischarge = table[0][1] * multiplier;
    // A rating table that reaches the peak inflow need not reach beyond it.
    maxDischarge = Math.max(Math.min(maxDischarge, table[table.length - 1][1] * multiplier), needed);
  }
  const field = control.type === 'weir' && control.kind === 'rating-table' ? 'control.ratingTable' : 'control';
  return tabulatedOutflowRating({ crestLevel, levelFor: (q) => levelPassing(r, q), maxDischarge, minDischarge, field });
}
