import { InvalidInputError, requireFinite, requireNonNegative, requirePositive } from '../errors';
import { broadCrestedRating } from './broad-crested';
import { ogeeRating } from './ogee';
import { ratingTableRating } from './rating-table';
import { sharpCrestedRating } from './sharp-crested';
import type { FreeFlowRating, WeirSpec } from './weir-types';

const KINDS = ['sharp-crested', 'broad-crested', 'ogee', 'rating-table'] as const;

type Rating = FreeFlowRating & { dischargeRange?: [number, number] };

/** The free-flow rating for a structure, after checking the fields every kind shares. */
export function freeFlowRating(spec: WeirSpec, field: string): Rating {
  const multiplier = spec.coefficientMultiplier ?? 1;
  requirePositive(multiplier, `${field}.coefficientMultiplier`);
  const rating = unscaledRating(spec, field);
  if (multiplier === 1) return rating;
  return {
    ...rating,
    discharge: (h, energyHead) => multiplier * rating.discharge(h, energyHead),
    coefficient: (h, energyHead) => multiplier * rating.coefficient(h, energyHead),
    coefficientSource: `${rating.coefficientSource}, scaled by ${multiplier}`,
    ...(rating.dischargeRange ? { dischargeRange: [multiplier * rating.dischargeRange[0], multiplier * rating.dischargeRange[1]] } : {}),
  };
}

function unscaledRating(spec: WeirSpec, field: string): Rating {
  if (!KINDS.includes(spec.kind)) throw new InvalidInputError(`${field}.kind`, `must be one of ${KINDS.join(', ')}`);
  if (spec.kind === 'rating-table') requireNonNegative(spec.sillHeight, `${field}.sillHeight`);
  else requirePositive(spec.sillHeight, `${field}.sillHeight`);
  if (spec.kind !== 'rating-table') requirePositive(spec.crestLength, `${field}.crestLength`);
  if (spec.tailwaterDepth !== undefined) requireFinite(spec.tailwaterDepth, `${field}.tailwaterDepth`);
  switch (spec.kind) {
    case 'sharp-crested':
      return sharpCrestedRating(spec, field);
    case 'broad-crested':
      return broadCrestedRating(spec, field);
    case 'ogee':
      return ogeeRating(spec, field);
    case 'rating-table':
      return ratingTableRating(spec, field);
  }
}
