// The storage-indication relation 2S/Δt + O and its inverse: the level-pool routing's one equation per step.
import { InvalidInputError } from '../errors';
import { brentRoot } from '../solvers';
import type { CubicMetres, Metres } from '../units';
import type { OutflowRating } from './outflow-rating';
import type { Seconds } from './routing-result';
import type { StorageCurve } from './storage-curve';

export interface ReservoirModel {
  curve: StorageCurve;
  rating: OutflowRating;
  /** Field named when the storage runs out. */
  storageField: string;
}

export interface PoolState {
  volume: CubicMetres;
  level: Metres;
  outflow: number;
}

export function poolStateAtVolume(model: ReservoirModel, volume: CubicMetres): PoolState {
  const level = model.curve.levelAt(volume);
  return { volume, level, outflow: model.rating.dischargeAt(level) };
}

function highestVolume(model: ReservoirModel): CubicMetres {
  const top = Math.min(model.curve.highest ?? Infinity, model.rating.highestLevel);
  return model.curve.volumeAt(top);
}

/**
 * The state with 2S/Δt + O(S) = `indication`. The left side rises with S (O rises with the level), so the root is
 * unique; it lies between V̂ − Δt·O(V̂)/2 and V̂ = Δt·indication/2, the storage if nothing flowed out.
 */
export function stateForIndication(model: ReservoirModel, indication: number, dt: Seconds): PoolState {
  const lowestVolume = model.curve.lowest === null ? -Infinity : model.curve.volumeAt(model.curve.lowest);
  const top = highestVolume(model);
  const unconstrained = (dt * indication) / 2;
  const hi = Math.min(unconstrained, top);
  const surplus = (volume: CubicMetres) => (2 * volume) / dt + model.rating.dischargeAt(model.curve.levelAt(volume)) - indication;
  if (hi < unconstrained && surplus(hi) < 0) {
    const limit = model.curve.highest !== null && model.curve.highest <= model.rating.highestLevel ? 'the top of the storage table' : 'the highest level the structure was rated to';
    throw new InvalidInputError(model.storageField, `runs out: the flood rises above ${limit} (${model.curve.levelAt(top).toFixed(3)} m above the datum); extend the storage table or check the spillway`);
  }
  const lo = Math.max(hi - (dt * model.rating.dischargeAt(model.curve.levelAt(hi))) / 2, lowestVolume);
  if (surplus(lo) > 0) {
    throw new InvalidInputError(model.storageField, `does not reach low enough: the reservoir draws down below its lowest row (${(model.curve.lowest ?? 0).toFixed(3)} m above the datum); extend the table downwards`);
  }
  const volume = hi === lo ? hi : brentRoot(surplus, lo, hi, { tolerance: 1e-13 * Math.max(Math.abs(hi), 1), field: model.storageField });
  return poolStateAtVolume(model, volume);
}
