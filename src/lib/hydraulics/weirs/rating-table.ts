import { InvalidInputError } from '../errors';
import type { CubicMetresPerSecond, Metres } from '../units';
import { monotoneCubic } from './monotone-cubic';
import { RECTANGULAR_WEIR_EXPONENT, villemonteRelation } from './submergence';
import { check, type FreeFlowRating, type WeirSpec } from './weir-types';

/**
 * The rating's local exponent n = d ln Q / d ln h, the n of Villemonte's (1947) relation, which he wrote for any free-flow
 * rating Q ∝ h^n; read off the table by a central difference. Outside a sensible range (a table starting at a level that
 * is not the crest) it falls back to the rectangular weir's 1.5.
 */
function localExponent(discharge: (h: Metres) => CubicMetresPerSecond, head: Metres, [lo, hi]: [Metres, Metres]): number {
  const step = Math.min(0.01 * head, head - lo, hi - head);
  if (!(step > 0)) return RECTANGULAR_WEIR_EXPONENT;
  const n = (Math.log(discharge(head + step)) - Math.log(discharge(head - step))) / (Math.log(head + step) - Math.log(head - step));
  return Number.isFinite(n) && n > 0.5 && n < 5 ? n : RECTANGULAR_WEIR_EXPONENT;
}

type RatingPoint = [level: Metres, discharge: CubicMetresPerSecond];

function validatedTable(table: RatingPoint[] | undefined, field: string): RatingPoint[] {
  const at = `${field}.ratingTable`;
  if (!Array.isArray(table) || table.length < 2) throw new InvalidInputError(at, 'needs at least two level–discharge pairs');
  table.forEach(([level, discharge], i) => {
    if (!Number.isFinite(level) || !Number.isFinite(discharge)) throw new InvalidInputError(`${at}[${i}]`, 'level and discharge must be finite numbers');
    if (level < 0 || discharge < 0) throw new InvalidInputError(`${at}[${i}]`, 'level and discharge must be 0 or more');
    if (i > 0 && (level <= table[i - 1][0] || discharge <= table[i - 1][1])) {
      throw new InvalidInputError(`${at}[${i}]`, 'levels and discharges must both increase strictly down the table');
    }
  });
  return table;
}

/**
 * A user's level–discharge rating for any other structure, the level measured above the crest.
 * A measured rating already contains the approach velocity, so the equation uses the measured head.
 */
export function ratingTableRating(spec: WeirSpec, field: string): FreeFlowRating & { dischargeRange: [number, number] } {
  const table = validatedTable(spec.ratingTable, field);
  const interpolant = monotoneCubic(
    table.map(([level]) => level),
    table.map(([, discharge]) => discharge),
  );
  const levels: [Metres, Metres] = [interpolant.xMin, interpolant.xMax];
  return {
    discharge: (h) => interpolant.at(h),
    coefficient: () => 1,
    validity: (h) => [check('head within the rating table (m)', h, levels[0], levels[1])],
    usesEnergyHead: false,
    headFloor: levels[0],
    headLimit: levels[1],
    coefficientSource: 'User rating table, monotone cubic interpolation (Fritsch & Carlson 1980)',
    coefficientIsDefault: false,
    coefficientForm: { symbol: '', equation: 'Q read from the rating table at h', unit: 'none' },
    submergence: villemonteRelation((h) => localExponent(interpolant.at, h, levels), 'n read off the rating table at the head'),
    notes: [],
    dischargeRange: [table[0][1], table[table.length - 1][1]],
  };
}
