// Test helpers for routing: a linear reservoir (storage = K × outflow) and its analytic responses.
import type { OutflowRating } from '@/lib/hydraulics/routing/outflow-rating';
import { type ReservoirModel } from '@/lib/hydraulics/routing/storage-indication';
import { storageCurve } from '@/lib/hydraulics/routing/storage-curve';

/** A pool of constant area A whose outflow is A(h − h₀)/K above h₀, so that S = K·O exactly. */
export function linearReservoir(area: number, k: number, crestLevel: number): ReservoirModel {
  const rating: OutflowRating = { crestLevel, highestLevel: crestLevel + 1e6, dischargeAt: (h) => (h <= crestLevel ? 0 : (area * (h - crestLevel)) / k) };
  return { curve: storageCurve({ kind: 'constant-area', area }), rating, storageField: 'reservoir.storage' };
}

/**
 * Response of dO/dt = (I − O)/K, O(0) = 0, to a ramp I = t (the linear ODE's solution by an integrating factor):
 * r(t) = t − K(1 − e^(−t/K)) for t ≥ 0.
 */
export function rampResponse(t: number, k: number): number {
  return t <= 0 ? 0 : t - k * -Math.expm1(-t / k);
}

/** Outflow for a triangular inflow 0 → peak at tp → 0 at tb, by superposing three ramps. */
export function triangularResponse(t: number, k: number, peak: number, tp: number, tb: number): number {
  const rise = peak / tp;
  const fall = peak / (tb - tp);
  return rise * rampResponse(t, k) - (rise + fall) * rampResponse(t - tp, k) + fall * rampResponse(t - tb, k);
}
