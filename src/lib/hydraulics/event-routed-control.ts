// The depth at the control in a routed event: the peak reservoir level, with the structure as it is at the peak outflow.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ControlAdjustments } from './case-control';
import type { ReachModel } from './case-reach';
import { type ChannelDepths, channelDepths } from './channel-depths';
import { type HeldControl, heldControl } from './event-control';
import type { RoutingResult } from './routing/routing-result';
import type { Metres } from './units';

const m = (x: Metres) => `${x.toFixed(3)} m`;

/**
 * The with-scheme profile upstream starts from the peak reservoir level and carries the peak inflow (`inflow`, the
 * channel's depths at that flow). The structure's details (head, coefficient, submergence) are those at the peak
 * outflow, which in level-pool routing passes at the peak level.
 */
export function routedHeldControl(input: CaseInput, model: ReachModel, adjust: ControlAdjustments, routing: RoutingResult, inflow: ChannelDepths): HeldControl {
  const peakDepth = routing.peakLevel.level - model.bedLevelAtControl;
  const peakOutflow = routing.outflowPeak.discharge;
  const sill = input.control.type === 'weir' ? (adjust.sillHeight ?? input.control.sillHeight) : 0;
  const atPeak = peakOutflow > 0 ? channelDepths(input, model, peakOutflow, 'reservoir') : null;
  const held = atPeak ? heldControl(input, model.controlSection, peakOutflow, adjust, atPeak.without.depth, atPeak.critical, atPeak.normal) : null;
  const structure = held?.structure ?? { head: 0, depth: sill, weir: null, warnings: [] };
  const reservoirHolds = peakDepth > inflow.without.depth && peakDepth > inflow.critical;
  if (!reservoirHolds) {
    return {
      structure,
      startDepth: inflow.without.depth,
      controls: false,
      explanation: `The peak reservoir level (${m(peakDepth)} deep at the structure) is no higher than the channel's own level for the peak inflow (${m(inflow.without.depth)} deep), so upstream of the reservoir the water stands at the channel's own level.`,
      warnings: held?.warnings ?? [],
    };
  }
  // The head is read off the peak level itself; the rating gives it to within its interpolation (well below 1 µm).
  const head = peakDepth - sill;
  const atPeakLevel = { ...structure, head, depth: peakDepth, weir: structure.weir && { ...structure.weir, head } };
  return { structure: atPeakLevel, startDepth: peakDepth, controls: true, explanation: null, warnings: held?.warnings ?? [] };
}
