// The modified Puls (storage-indication) march through a reservoir at a fixed time step.
import type { Metres } from '../units';
import { hydrographDuration, type InflowHydrograph, inflowReader } from './inflow-hydrograph';
import type { RoutingStep, Seconds } from './routing-result';
import { poolStateAtVolume, type ReservoirModel, stateForIndication } from './storage-indication';

export interface PulsMarch {
  timeStep: Seconds;
  steps: RoutingStep[];
  peakLevel: { time: Seconds; level: Metres };
  outflowPeak: { time: Seconds; discharge: number };
}

/**
 * Level-pool routing by the storage-indication method: continuity over one step with the trapezoidal rule,
 * 2Sⱼ₊₁/Δt + Oⱼ₊₁ = Iⱼ + Iⱼ₊₁ + 2Sⱼ/Δt − Oⱼ (Chow, Maidment and Mays, Applied Hydrology, 1988, §8.2, eq. 8.2.3 — equation number from memory),
 * solved for the new storage at each step. `stepCount` equal steps span the hydrograph.
 */
export function modifiedPulsMarch(model: ReservoirModel, hydrograph: InflowHydrograph, startLevel: Metres, stepCount: number): PulsMarch {
  const duration = hydrographDuration(hydrograph);
  const dt = duration / stepCount;
  const inflowAt = inflowReader(hydrograph);
  const startVolume = model.curve.volumeAt(startLevel);
  let state = poolStateAtVolume(model, startVolume);
  let inflow = inflowAt(0);
  const steps: RoutingStep[] = [{ time: 0, inflow, outflow: state.outflow, level: state.level, storage: 0 }];
  let peakLevel = { time: 0, level: state.level };
  let outflowPeak = { time: 0, discharge: state.outflow };
  for (let n = 1; n <= stepCount; n++) {
    const time = n === stepCount ? duration : n * dt;
    const nextInflow = inflowAt(time);
    const indication = inflow + nextInflow + (2 * state.volume) / dt - state.outflow;
    state = stateForIndication(model, indication, dt);
    inflow = nextInflow;
    steps.push({ time, inflow, outflow: state.outflow, level: state.level, storage: state.volume - startVolume });
    if (state.level > peakLevel.level) peakLevel = { time, level: state.level };
    if (state.outflow > outflowPeak.discharge) outflowPeak = { time, discharge: state.outflow };
  }
  return { timeStep: dt, steps, peakLevel, outflowPeak };
}
