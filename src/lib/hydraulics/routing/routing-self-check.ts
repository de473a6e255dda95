// An independent check of the routing: dS/dt = I − O(h) integrated by an extrapolation ODE solver.
import { Solver } from '../profiles/odex-solver';
import { EngineError } from '../errors';
import type { CubicMetres, Metres } from '../units';
import { type InflowHydrograph, inflowReader } from './inflow-hydrograph';
import type { RoutingSelfCheck, Seconds } from './routing-result';
import type { ReservoirModel } from './storage-indication';

export const ROUTING_SELF_CHECK_METHOD = 'odex (Gragg–Bulirsch–Stoer extrapolation) on dS/dt = I(t) − O(h(S)), one integration per hydrograph interval';

const MAX_SOLVER_STEPS = 5_000;

interface Peak {
  time: Seconds;
  volume: CubicMetres;
}

/**
 * The continuity equation of a level pool, dS/dt = I(t) − O(h) (Chow, Maidment and Mays, Applied Hydrology, 1988, §8.2,
 * eq. 8.2.1 — equation number from memory), integrated from the start storage over each interval of the hydrograph, so
 * the solver never steps across a corner of I(t). The peak storage is where dS/dt falls through zero, found inside a
 * step with the solver's dense output.
 */
function integratedPeak(model: ReservoirModel, hydrograph: InflowHydrograph, startVolume: CubicMetres): Peak | null {
  const inflowAt = inflowReader(hydrograph);
  const rate = (t: Seconds, volume: CubicMetres) => inflowAt(t) - model.rating.dischargeAt(model.curve.levelAt(volume));
  const scale = Math.max(Math.abs(startVolume), ...hydrograph.discharges.map((q, i) => q * (hydrograph.times[i] - (hydrograph.times[i - 1] ?? 0))), 1);
  let peak: Peak = { time: 0, volume: startVolume };
  let volume = startVolume;
  for (let i = 1; i < hydrograph.times.length; i++) {
    const solver = new Solver(1);
    solver.denseOutput = true;
    solver.relativeTolerance = 1e-10;
    solver.absoluteTolerance = 1e-10 * scale;
    solver.maxSteps = MAX_SOLVER_STEPS;
    const result = solver.solve((t, y) => [rate(t, y[0])], hydrograph.times[i - 1], [volume], hydrograph.times[i], (_n, tOld, t, y, dense) => {
      if (y[0] > peak.volume) peak = { time: t, volume: y[0] };
      if (dense === undefined || t === tOld || !(rate(tOld, dense(0, tOld)) > 0 && rate(t, y[0]) < 0)) return;
      let [a, b] = [tOld, t];
      for (let k = 0; k < 60 && b - a > 1e-9 * Math.max(1, t); k++) {
        const mid = (a + b) / 2;
        if (rate(mid, dense(0, mid)) > 0) a = mid;
        else b = mid;
      }
      const at = (a + b) / 2;
      const v = dense(0, at);
      if (v > peak.volume) peak = { time: at, volume: v };
    });
    if (result.outcome !== 0 || !Number.isFinite(result.y[0])) return null;
    volume = result.y[0];
  }
  return peak;
}

export interface RoutingSelfCheckOutcome {
  report: RoutingSelfCheck | null;
  warnings: string[];
}

export function routingSelfCheck(
  model: ReservoirModel,
  hydrograph: InflowHydrograph,
  startLevel: Metres,
  routed: { peakLevel: Metres; peakOutflow: number },
): RoutingSelfCheckOutcome {
  let peak: Peak | null;
  try {
    peak = integratedPeak(model, hydrograph, model.curve.volumeAt(startLevel));
  } catch (error) {
    if (!(error instanceof EngineError)) throw error;
    peak = null;
  }
  if (peak === null) return { report: null, warnings: ['The independent odex integration of the routing did not finish, so the routing has no self-check.'] };
  const peakLevel = model.curve.levelAt(peak.volume);
  const peakOutflow = model.rating.dischargeAt(peakLevel);
  return {
    report: {
      method: ROUTING_SELF_CHECK_METHOD,
      peakLevel,
      peakLevelDifference: Math.abs(routed.peakLevel - peakLevel),
      peakOutflowDifference: Math.abs(routed.peakOutflow - peakOutflow),
    },
    warnings: [],
  };
}
