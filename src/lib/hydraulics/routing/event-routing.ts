// Routing one event of a case through its reservoir, in SI, with the perturbations of sensitivity runs.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ControlAdjustments } from '../case-control';
import type { ReachModel } from '../case-reach';
import { InvalidInputError } from '../errors';
import type { CubicMetresPerSecond } from '../units';
import type { InflowHydrograph } from './inflow-hydrograph';
import { NRCS_SHAPE_SOURCE, unitShapeHydrograph } from './nrcs-unit-hydrograph';
import { type RoutingOutcome, routeReservoir } from './route-reservoir';
import { scaledStorage, storageCurve } from './storage-curve';
import { crestLevelOf, structureRating } from './structure-rating';

export interface RoutingFactors {
  /** Scales every storage volume (sensitivity); 1 otherwise. */
  storage: number;
  /** Stretches the hydrograph's times, scaling its volume at the same peak (sensitivity); 1 otherwise. */
  hydrographVolume: number;
}

export interface EventRoutingContext {
  input: CaseInput;
  model: ReachModel;
  adjust: ControlAdjustments;
  /** Climate allowance and sensitivity factor on the discharges together. */
  dischargeScale: number;
  factors: RoutingFactors;
  skipSelfCheck: boolean;
}

type CaseEvent = CaseInput['events'][number];

const HOUR = 3600;

/** The event's hydrograph in seconds and m³/s, its ordinates scaled like the event's discharge. */
function eventHydrograph(event: CaseEvent, index: number, ctx: EventRoutingContext, field: string): { hydrograph: InflowHydrograph; shapeSource: string | null } {
  const shape = event.hydrograph;
  const stretch = ctx.factors.hydrographVolume;
  if (shape === undefined) throw new InvalidInputError(field, 'is required to route the event');
  if (shape.kind === 'table') {
    return { hydrograph: { times: shape.points.map((p) => p.time * HOUR * stretch), discharges: shape.points.map((p) => p.discharge * ctx.dischargeScale) }, shapeSource: null };
  }
  const peak: CubicMetresPerSecond = event.discharge * ctx.dischargeScale;
  return { hydrograph: unitShapeHydrograph(shape.shape, peak, shape.timeToPeak * HOUR * stretch, field, `events[${index}].discharge`), shapeSource: NRCS_SHAPE_SOURCE };
}

/** The event routed through the reservoir, or null when the event has no hydrograph (or the case no reservoir). */
export function routeCaseEvent(event: CaseEvent, index: number, ctx: EventRoutingContext): RoutingOutcome | null {
  const reservoir = ctx.input.reservoir;
  if (event.hydrograph === undefined || reservoir === undefined) return null;
  const field = `events[${index}].hydrograph`;
  const { hydrograph, shapeSource } = eventHydrograph(event, index, ctx, field);
  const curve = storageCurve(scaledStorage(reservoir.storage, ctx.factors.storage), 'reservoir.storage');
  const startLevel = reservoir.startLevel ?? crestLevelOf(ctx.input, ctx.model, ctx.adjust);
  if (curve.lowest !== null && curve.highest !== null && (startLevel < curve.lowest || startLevel > curve.highest)) {
    const what = reservoir.startLevel === undefined ? 'the crest level, the default level at the start of the flood,' : 'it';
    throw new InvalidInputError(reservoir.startLevel === undefined ? 'reservoir.storage.rows' : 'reservoir.startLevel', `must cover ${what} (${startLevel.toFixed(3)} m above the datum): the storage table runs from ${curve.lowest.toFixed(3)} to ${curve.highest.toFixed(3)} m`);
  }
  const peakInflow = Math.max(...hydrograph.discharges);
  const rating = structureRating({ input: ctx.input, model: ctx.model, adjust: ctx.adjust, peakInflow, startLevel });
  const outcome = routeReservoir({
    model: { curve, rating, storageField: 'reservoir.storage' },
    hydrograph,
    hydrographKind: event.hydrograph.kind,
    shapeSource,
    startLevel,
    reservoirLength: reservoir.length ?? null,
    hydrographField: field,
    skipSelfCheck: ctx.skipSelfCheck,
  });
  const assumptions = [
    ...outcome.result.assumptions,
    'Upstream of the reservoir the backwater profile starts from the peak reservoir level and carries the peak inflow: conservative, since the inflow has passed its peak before the reservoir peaks.',
    ...(reservoir.length !== undefined ? [`Limits within ${reservoir.length.toFixed(0)} m of the structure (the reservoir's length) are checked against the peak reservoir level.`] : []),
  ];
  return { result: { ...outcome.result, assumptions }, warnings: outcome.warnings };
}
