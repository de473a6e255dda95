// The reservoir's storage against its level, from a level–area table, a level–volume table or a constant area.
import { InvalidInputError, requirePositive } from '../errors';
import type { CubicMetres, Metres, SquareMetres } from '../units';

export type StorageSpec =
  | { kind: 'level-area'; rows: readonly { level: Metres; area: SquareMetres }[] }
  | { kind: 'level-volume'; rows: readonly { level: Metres; volume: CubicMetres }[] }
  | { kind: 'constant-area'; area: SquareMetres };

export interface StorageCurve {
  kind: StorageSpec['kind'];
  rows: number;
  /** Volume below `level` measured from the table's lowest level (a constant area: from the datum). */
  volumeAt(level: Metres): CubicMetres;
  levelAt(volume: CubicMetres): Metres;
  areaAt(level: Metres): SquareMetres;
  /** Range the table covers; null for a constant area. */
  lowest: Metres | null;
  highest: Metres | null;
}

const fmt = (x: number) => `${x.toFixed(3)} m above the datum`;

function checkLevels(levels: readonly Metres[], field: string): void {
  if (levels.length < 2) throw new InvalidInputError(`${field}.rows`, 'needs at least two rows');
  levels.forEach((level, i) => {
    if (!Number.isFinite(level)) throw new InvalidInputError(`${field}.rows[${i}].level`, 'must be a finite number');
    if (i > 0 && !(level > levels[i - 1])) throw new InvalidInputError(`${field}.rows[${i}].level`, 'must be higher than the level of the row before it');
  });
}

/** The row index i with levels[i] ≤ level ≤ levels[i + 1]; a level outside the table is an explained error. */
function segmentOf(levels: readonly Metres[], level: Metres, field: string): number {
  const last = levels.length - 1;
  if (!(level >= levels[0] - 1e-9) || !(level <= levels[last] + 1e-9)) {
    throw new InvalidInputError(`${field}.rows`, `covers levels from ${fmt(levels[0])} to ${fmt(levels[last])}, but the reservoir reaches ${fmt(level)}; extend the table to cover it`);
  }
  let lo = 0;
  let hi = last - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (levels[mid] <= level) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/**
 * Volume from a level–area table by the trapezoidal rule, V(hᵢ₊₁) = V(hᵢ) + (Aᵢ + Aᵢ₊₁)/2·(hᵢ₊₁ − hᵢ), the usual way a
 * storage curve is built from surveyed contour areas (Chow, Maidment and Mays, Applied Hydrology, 1988, §8.2 — from
 * memory). Between rows the area is taken as linear in level, so the volume is exactly the integral of that area.
 */
function levelAreaCurve(rows: readonly { level: Metres; area: SquareMetres }[], field: string): StorageCurve {
  const levels = rows.map((r) => r.level);
  checkLevels(levels, field);
  rows.forEach((r, i) => {
    if (!Number.isFinite(r.area) || r.area < 0 || (i > 0 && r.area === 0)) throw new InvalidInputError(`${field}.rows[${i}].area`, i === 0 ? 'must be 0 or more' : 'must be greater than 0');
  });
  const areas = rows.map((r) => r.area);
  const volumes = [0];
  for (let i = 1; i < rows.length; i++) volumes.push(volumes[i - 1] + ((areas[i] + areas[i - 1]) / 2) * (levels[i] - levels[i - 1]));
  const slope = (i: number) => (areas[i + 1] - areas[i]) / (levels[i + 1] - levels[i]);
  return {
    kind: 'level-area',
    rows: rows.length,
    lowest: levels[0],
    highest: levels[levels.length - 1],
    areaAt(level) {
      const i = segmentOf(levels, level, field);
      return areas[i] + slope(i) * (level - levels[i]);
    },
    volumeAt(level) {
      const i = segmentOf(levels, level, field);
      const d = level - levels[i];
      return volumes[i] + areas[i] * d + (slope(i) * d * d) / 2;
    },
    levelAt(volume) {
      const i = volumeSegment(volumes, volume, levels, field);
      const extra = volume - volumes[i];
      // Root of s·d²/2 + Aᵢ·d − ΔV = 0, written without cancellation.
      const d = extra <= 0 ? 0 : (2 * extra) / (areas[i] + Math.sqrt(areas[i] * areas[i] + 2 * slope(i) * extra));
      return levels[i] + d;
    },
  };
}

function volumeSegment(volumes: readonly CubicMetres[], volume: CubicMetres, levels: readonly Metres[], field: string): number {
  const last = volumes.length - 1;
  if (volume < volumes[0] - 1e-9 * volumes[last] || volume > volumes[last] * (1 + 1e-12)) {
    throw new InvalidInputError(`${field}.rows`, `holds ${volumes[last].toPrecision(4)} m³ up to ${fmt(levels[last])}, but the flood needs more storage than that; extend the table upwards`);
  }
  let i = 0;
  while (i < last - 1 && volume > volumes[i + 1]) i++;
  return i;
}

/** Volume read linearly between the rows of a level–volume table (common practice); the area is the slope between rows. */
function levelVolumeCurve(rows: readonly { level: Metres; volume: CubicMetres }[], field: string): StorageCurve {
  const levels = rows.map((r) => r.level);
  checkLevels(levels, field);
  const volumes = rows.map((r) => r.volume);
  volumes.forEach((v, i) => {
    if (!Number.isFinite(v) || v < 0) throw new InvalidInputError(`${field}.rows[${i}].volume`, 'must be 0 or more');
    if (i > 0 && !(v > volumes[i - 1])) throw new InvalidInputError(`${field}.rows[${i}].volume`, 'must be greater than the volume of the row before it');
  });
  const area = (i: number) => (volumes[i + 1] - volumes[i]) / (levels[i + 1] - levels[i]);
  return {
    kind: 'level-volume',
    rows: rows.length,
    lowest: levels[0],
    highest: levels[levels.length - 1],
    areaAt: (level) => area(segmentOf(levels, level, field)),
    volumeAt(level) {
      const i = segmentOf(levels, level, field);
      return volumes[i] - volumes[0] + area(i) * (level - levels[i]);
    },
    levelAt(volume) {
      const absolute = volume + volumes[0];
      const i = volumeSegment(volumes, absolute, levels, field);
      return levels[i] + (absolute - volumes[i]) / area(i);
    },
  };
}

function constantAreaCurve(area: SquareMetres, field: string): StorageCurve {
  requirePositive(area, `${field}.area`);
  return { kind: 'constant-area', rows: 0, lowest: null, highest: null, areaAt: () => area, volumeAt: (level) => area * level, levelAt: (volume) => volume / area };
}

export function storageCurve(spec: StorageSpec, field = 'reservoir.storage'): StorageCurve {
  switch (spec.kind) {
    case 'level-area':
      return levelAreaCurve(spec.rows, field);
    case 'level-volume':
      return levelVolumeCurve(spec.rows, field);
    case 'constant-area':
      return constantAreaCurve(spec.area, field);
  }
}

/** The same curve with every volume (and area) scaled: a storage sensitivity run. */
export function scaledStorage(spec: StorageSpec, factor: number): StorageSpec {
  if (spec.kind === 'constant-area') return { ...spec, area: spec.area * factor };
  if (spec.kind === 'level-area') return { ...spec, rows: spec.rows.map((r) => ({ ...r, area: r.area * factor })) };
  return { ...spec, rows: spec.rows.map((r) => ({ ...r, volume: r.volume * factor })) };
}
