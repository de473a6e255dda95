// The routing's volume balance: what came in, what went out, what was stored.
import type { RoutingStep, VolumeBalance } from './routing-result';

/**
 * Inflow and outflow volumes by the trapezoidal rule over the routing steps, the same rule the storage-indication
 * equation integrates (Chow, Maidment and Mays, Applied Hydrology, 1988, §8.2, eq. 8.2.2 — equation number from memory), so the residual is round-off
 * plus the tolerance of each step's solution.
 */
export function volumeBalance(steps: readonly RoutingStep[]): VolumeBalance {
  let inflow = 0;
  let outflow = 0;
  for (let n = 1; n < steps.length; n++) {
    const dt = steps[n].time - steps[n - 1].time;
    inflow += ((steps[n].inflow + steps[n - 1].inflow) / 2) * dt;
    outflow += ((steps[n].outflow + steps[n - 1].outflow) / 2) * dt;
  }
  const storageChange = steps[steps.length - 1].storage - steps[0].storage;
  return { inflow, outflow, storageChange, residual: inflow - outflow - storageChange };
}
