// A routing result in US customary units: levels and lengths to ft, areas to ft², volumes to ft³, flows to ft³/s.
import type { Back } from '../case-result-units';
import type { RoutingResult } from './routing-result';

/** Routing figures back to ft, ft², ft³ and ft³/s; times stay in seconds. */
export function routingToUS(r: RoutingResult, b: Back): RoutingResult {
  const L = b.length;
  const Q = b.discharge;
  // m³ to ft³ is the factor of m³/s to ft³/s, the seconds staying seconds.
  const V = b.discharge;
  const A = (a: number) => L(L(a));
  const orNull = (x: number | null, f: (v: number) => number) => (x === null ? null : f(x));
  return {
    ...r,
    hydrograph: { ...r.hydrograph, peakInflow: Q(r.hydrograph.peakInflow), volume: V(r.hydrograph.volume) },
    storage: {
      ...r.storage,
      lowestLevel: orNull(r.storage.lowestLevel, L),
      highestLevel: orNull(r.storage.highestLevel, L),
      areaAtStart: A(r.storage.areaAtStart),
      startLevel: L(r.storage.startLevel),
      reservoirLength: orNull(r.storage.reservoirLength, L),
    },
    refinement: { ...r.refinement, peakLevelChangeOnHalving: L(r.refinement.peakLevelChangeOnHalving), tolerance: L(r.refinement.tolerance) },
    selfCheck: r.selfCheck && { ...r.selfCheck, peakLevel: L(r.selfCheck.peakLevel), peakLevelDifference: L(r.selfCheck.peakLevelDifference), peakOutflowDifference: Q(r.selfCheck.peakOutflowDifference) },
    inflowPeak: { ...r.inflowPeak, discharge: Q(r.inflowPeak.discharge) },
    outflowPeak: { ...r.outflowPeak, discharge: Q(r.outflowPeak.discharge) },
    attenuation: Q(r.attenuation),
    peakLevel: { ...r.peakLevel, level: L(r.peakLevel.level) },
    volumeBalance: { inflow: V(r.volumeBalance.inflow), outflow: V(r.volumeBalance.outflow), storageChange: V(r.volumeBalance.storageChange), residual: V(r.volumeBalance.residual) },
    steps: r.steps.map((s) => ({ time: s.time, inflow: Q(s.inflow), outflow: Q(s.outflow), level: L(s.level), storage: V(s.storage) })),
  };
}
