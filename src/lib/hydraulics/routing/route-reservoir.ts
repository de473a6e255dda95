// Routing one flood through a reservoir: the converged modified Puls march, its self-check and its summary.
import type { Metres } from '../units';
import { hydrographDuration, hydrographPeak, hydrographVolume, type InflowHydrograph } from './inflow-hydrograph';
import { PEAK_LEVEL_TOLERANCE, refinedPulsMarch } from './routing-refinement';
import type { HydrographSummary, RoutingResult } from './routing-result';
import { routingSelfCheck } from './routing-self-check';
import type { ReservoirModel } from './storage-indication';
import { routingTableRows } from './routing-table-rows';
import { volumeBalance } from './volume-balance';

export const MODIFIED_PULS_SOURCE = 'Storage-indication (modified Puls) level-pool routing: Chow, Maidment and Mays, Applied Hydrology, 1988, ch. 8 (§8.2)';

export interface RoutingInput {
  model: ReservoirModel;
  hydrograph: InflowHydrograph;
  hydrographKind: HydrographSummary['kind'];
  shapeSource: string | null;
  startLevel: Metres;
  reservoirLength: Metres | null;
  /** Field named when the hydrograph needs too many steps. */
  hydrographField: string;
  /** Sizing runs need only the peak level. */
  skipSelfCheck: boolean;
}

export interface RoutingOutcome {
  result: RoutingResult;
  warnings: string[];
}

const h = (s: number) => `${(s / 3600).toFixed(2)} h`;

export function routeReservoir(input: RoutingInput): RoutingOutcome {
  const { model, hydrograph, startLevel } = input;
  const { march, refinement } = refinedPulsMarch(model, hydrograph, startLevel, input.hydrographField);
  const inflowPeak = hydrographPeak(hydrograph);
  const warnings: string[] = [];
  const check = input.skipSelfCheck ? { report: null, warnings: [] } : routingSelfCheck(model, hydrograph, startLevel, { peakLevel: march.peakLevel.level, peakOutflow: march.outflowPeak.discharge });
  warnings.push(...check.warnings);
  if (check.report && check.report.peakLevelDifference > 2 * PEAK_LEVEL_TOLERANCE) {
    warnings.push(`The routing's self-check differs: the independent integration peaks ${(check.report.peakLevelDifference * 1000).toFixed(0)} mm away from the modified Puls peak level; check the hydrograph and the storage table.`);
  }
  const duration = hydrographDuration(hydrograph);
  if (march.peakLevel.time >= duration) {
    warnings.push(`The reservoir is still rising when the inflow hydrograph ends (${h(duration)}): the peak level may be higher; give the hydrograph until the outflow falls.`);
  }
  const assumptions = [
    'The reservoir is a level pool: its surface is level from the spillway to its head at every moment, as the storage-indication method assumes.',
    'The spillway passes the flow by the same rating as the steady check (approach velocity and submergence as entered).',
  ];
  const result: RoutingResult = {
    method: 'modified-puls',
    methodSource: MODIFIED_PULS_SOURCE,
    hydrograph: {
      kind: input.hydrographKind,
      shapeSource: input.shapeSource,
      points: hydrograph.times.length,
      duration,
      peakInflow: inflowPeak.discharge,
      timeToPeak: inflowPeak.time,
      volume: hydrographVolume(hydrograph),
    },
    storage: {
      kind: model.curve.kind,
      rows: model.curve.rows,
      lowestLevel: model.curve.lowest,
      highestLevel: model.curve.highest,
      areaAtStart: model.curve.areaAt(startLevel),
      startLevel,
      reservoirLength: input.reservoirLength,
    },
    refinement,
    selfCheck: check.report,
    inflowPeak,
    outflowPeak: march.outflowPeak,
    attenuation: inflowPeak.discharge - march.outflowPeak.discharge,
    lag: march.outflowPeak.time - inflowPeak.time,
    peakLevel: march.peakLevel,
    volumeBalance: volumeBalance(march.steps),
    steps: routingTableRows(march.steps, [march.peakLevel.time, march.outflowPeak.time]),
    assumptions,
  };
  return { result, warnings };
}
