// An inflow hydrograph as the engine routes it: discharge against time, linear between the given points.
import { InvalidInputError } from '../errors';
import type { CubicMetres, CubicMetresPerSecond } from '../units';
import type { Seconds } from './routing-result';

export interface InflowHydrograph {
  /** Seconds from the start, strictly increasing from 0. */
  times: readonly Seconds[];
  discharges: readonly CubicMetresPerSecond[];
}

/** Checks the points (the schema does too; the engine is also called directly). */
export function checkedHydrograph(h: InflowHydrograph, field: string): InflowHydrograph {
  if (h.times.length < 3 || h.times.length !== h.discharges.length) throw new InvalidInputError(field, 'needs at least three time–discharge points');
  if (h.times[0] !== 0) throw new InvalidInputError(`${field}.points[0].time`, 'must be 0: the hydrograph starts at time 0');
  h.times.forEach((t, i) => {
    if (!Number.isFinite(t) || (i > 0 && !(t > h.times[i - 1]))) throw new InvalidInputError(`${field}.points[${i}].time`, 'must be greater than the time before it');
    const q = h.discharges[i];
    if (!Number.isFinite(q) || q < 0) throw new InvalidInputError(`${field}.points[${i}].discharge`, 'must be 0 or more');
  });
  if (!h.discharges.some((q) => q > 0)) throw new InvalidInputError(field, 'has no flow: every discharge is 0');
  return h;
}

export function hydrographDuration(h: InflowHydrograph): Seconds {
  return h.times[h.times.length - 1];
}

/** A reader of I(t), linear between points; it remembers its place, so reading forward in time is cheap. */
export function inflowReader(h: InflowHydrograph): (t: Seconds) => CubicMetresPerSecond {
  const { times, discharges } = h;
  const last = times.length - 1;
  let i = 0;
  return (t) => {
    if (t <= 0) return discharges[0];
    if (t >= times[last]) return discharges[last];
    if (t < times[i]) i = 0;
    while (i < last - 1 && t > times[i + 1]) i++;
    const f = (t - times[i]) / (times[i + 1] - times[i]);
    return discharges[i] + f * (discharges[i + 1] - discharges[i]);
  };
}

/** Volume under the hydrograph by the trapezoidal rule, exact for the piecewise-linear hydrograph. */
export function hydrographVolume(h: InflowHydrograph): CubicMetres {
  let volume = 0;
  for (let i = 1; i < h.times.length; i++) volume += ((h.discharges[i] + h.discharges[i - 1]) / 2) * (h.times[i] - h.times[i - 1]);
  return volume;
}

/** The largest discharge and the first time it occurs. */
export function hydrographPeak(h: InflowHydrograph): { time: Seconds; discharge: CubicMetresPerSecond } {
  let best = 0;
  h.discharges.forEach((q, i) => {
    if (q > h.discharges[best]) best = i;
  });
  return { time: h.times[best], discharge: h.discharges[best] };
}

/** The same hydrograph with its discharges scaled (a climate allowance) and its times stretched (a volume sensitivity run). */
export function scaledHydrograph(h: InflowHydrograph, dischargeFactor: number, timeFactor = 1): InflowHydrograph {
  return { times: h.times.map((t) => t * timeFactor), discharges: h.discharges.map((q) => q * dischargeFactor) };
}
