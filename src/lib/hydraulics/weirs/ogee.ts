import { InvalidInputError, requireNonNegative, requirePositive } from '../errors';
import type { Metres } from '../units';
import {
  ABUTMENT_COEFFICIENTS,
  OGEE_HEAD_RATIO_RANGE,
  PIER_COEFFICIENTS,
  ogeeDesignCoefficient,
  ogeeHeadRatioFactor,
} from './ogee-coefficients';
import { villemonteRelation } from './submergence';
import { check, type FreeFlowRating, type WeirSpec } from './weir-types';

/**
 * Effective crest length Le = L′ − 2(N·Kp + Ka)·He
 * (USBR, Design of Small Dams, 3rd ed. (1987), ch. 9, effective crest length (equation number from memory)).
 */
export function ogeeEffectiveLength(
  netLength: Metres,
  pierCount: number,
  pierCoefficient: number,
  abutmentCoefficient: number,
  energyHead: Metres,
): Metres {
  return netLength - 2 * (pierCount * pierCoefficient + abutmentCoefficient) * energyHead;
}

/** Ogee spillway rating Q = C·Le·He^1.5 (USBR 1987, ch. 9) with C from P/Hd and He/Hd unless the user gives C. */
export function ogeeRating(spec: WeirSpec, field: string): FreeFlowRating {
  const netLength = spec.crestLength;
  const p = spec.sillHeight;
  const pierCount = spec.piers?.count ?? 0;
  if (!Number.isInteger(pierCount) || pierCount < 0) throw new InvalidInputError(`${field}.piers.count`, 'must be a whole number, 0 or more');
  const notes: string[] = [];
  let pierCoefficient = spec.piers?.coefficient ?? PIER_COEFFICIENTS.squareNosed;
  if (spec.piers?.coefficient !== undefined) requireNonNegative(pierCoefficient, `${field}.piers.coefficient`);
  else if (pierCount > 0) notes.push(`No pier coefficient was given; Kp = ${pierCoefficient} (square-nosed piers, the largest) was assumed.`);
  if (pierCount === 0) pierCoefficient = 0;
  const abutmentCoefficient = spec.abutmentCoefficient ?? ABUTMENT_COEFFICIENTS.squareHeadwall;
  if (spec.abutmentCoefficient !== undefined) requireNonNegative(abutmentCoefficient, `${field}.abutmentCoefficient`);
  else notes.push(`No abutment coefficient was given; Ka = ${abutmentCoefficient} (square abutments, the largest) was assumed.`);
  if (spec.designHead !== undefined) requirePositive(spec.designHead, `${field}.designHead`);
  notes.push('The ogee coefficient assumes a vertical upstream face and no effect of the downstream apron.');
  const contraction = pierCount * pierCoefficient + abutmentCoefficient;
  const effectiveLength = (energyHead: Metres) =>
    Math.max(0, ogeeEffectiveLength(netLength, pierCount, pierCoefficient, abutmentCoefficient, energyHead));
  const designHeadFor = (energyHead: Metres) => spec.designHead ?? energyHead;
  const userCoefficient = spec.coefficient;
  if (userCoefficient !== undefined) requirePositive(userCoefficient, `${field}.coefficient`);
  const coefficientAt = (energyHead: Metres) => {
    if (userCoefficient !== undefined) return userCoefficient;
    const designHead = designHeadFor(energyHead);
    if (!(designHead > 0)) return ogeeDesignCoefficient(Infinity) * ogeeHeadRatioFactor(OGEE_HEAD_RATIO_RANGE.min);
    return ogeeDesignCoefficient(p / designHead) * ogeeHeadRatioFactor(energyHead / designHead);
  };
  return {
    discharge: (_h, energyHead) => coefficientAt(energyHead) * effectiveLength(energyHead) * energyHead ** 1.5,
    coefficient: (_h, energyHead) => coefficientAt(energyHead),
    validity: (_h, energyHead) => {
      const designHead = designHeadFor(energyHead);
      return [
        check('energy head / design head', energyHead / designHead, OGEE_HEAD_RATIO_RANGE.min, OGEE_HEAD_RATIO_RANGE.max),
        check('effective length / net length', effectiveLength(energyHead) / netLength, 0.5),
      ];
    },
    usesEnergyHead: true,
    // Q = C·(L′ − 2kHe)·He^1.5 stops rising at He = 0.3·L′/k (from dQ/dHe = 0).
    ...(contraction > 0 ? { headLimit: (0.3 * netLength) / contraction } : {}),
    coefficientSource:
      userCoefficient !== undefined
        ? `C given by the user${spec.coefficientReason ? `: ${spec.coefficientReason}` : ''}`
        : `USBR Design of Small Dams (1987) Figs. 9-23 and 9-24 (digitised from memory)${spec.designHead === undefined ? ', design head = this head' : ''}`,
    coefficientIsDefault: userCoefficient === undefined,
    coefficientForm: { symbol: 'C', equation: 'Q = C·L·He^1.5 with L = L′ − 2(N·Kp + Ka)·He', unit: 'm^½/s' },
    // Villemonte's relation with n = 1.5 stands in for the USBR submergence curves, which this engine does not hold.
    submergence: villemonteRelation(),
    notes,
  };
}
