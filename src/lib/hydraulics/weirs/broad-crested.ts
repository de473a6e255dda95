import { requirePositive } from '../errors';
import { GRAVITY, type Metres } from '../units';
import { broadCrestedRelation } from './submergence';
import { check, type FreeFlowRating, type ValidityCheck, type WeirSpec } from './weir-types';

// Broad-crested weir, Q = Cd·(2/3)·√((2/3)·g)·b·H^1.5 with H the upstream energy head over the crest
// (Bos, Discharge Measurement Structures (1989), ch. 1, critical flow over a horizontal crest (from memory)).
const BROAD_CREST_FACTOR = (2 / 3) * Math.sqrt((2 / 3) * GRAVITY);

/** Square-edged (rectangular-profile) weir: Cd = 0.848 in 0.08 ≤ H/L ≤ 0.33 (Bos 1989; ISO 3846) (from memory). */
export const SQUARE_EDGED_COEFFICIENT = 0.848;

/** Round-nosed horizontal crest: Cd = 0.93 + 0.10 H/L (Bos 1989, ch. 4) (from memory). */
export function roundNosedCoefficient(energyHeadOverBreadth: number): number {
  return 0.93 + 0.1 * energyHeadOverBreadth;
}

const ROUND_NOSED_RANGE = { min: 0.05, max: 0.5 };
const SQUARE_EDGED_RANGE = { min: 0.08, max: 0.33 };

function sharedChecks(head: Metres, energyHead: Metres, spec: WeirSpec): ValidityCheck[] {
  // Practical limits of use per Bos (1989) (from memory): h ≥ 0.06 m, P ≥ 0.15 m, b ≥ 0.30 m.
  return [
    check('head (m)', head, 0.06),
    check('sill height (m)', spec.sillHeight, 0.15),
    check('crest length (m)', spec.crestLength, 0.3),
    check('energy head / sill height', energyHead / spec.sillHeight, 0, 1.5),
  ];
}

export function broadCrestedRating(spec: WeirSpec, field: string): FreeFlowRating {
  const b = spec.crestLength;
  const breadth = spec.crestBreadth;
  if (breadth !== undefined) requirePositive(breadth, `${field}.crestBreadth`);
  const nose = spec.noseShape ?? 'square-edged';
  const notes: string[] = [];
  const ratioChecks = (energyHead: Metres): ValidityCheck[] => {
    if (breadth === undefined) return [];
    const range = nose === 'round-nosed' ? ROUND_NOSED_RANGE : SQUARE_EDGED_RANGE;
    return [check('energy head / crest breadth', energyHead / breadth, range.min, range.max)];
  };
  let coefficientAt: (energyHead: Metres) => number;
  let coefficientSource: string;
  const userCoefficient = spec.coefficient;
  if (userCoefficient !== undefined) {
    requirePositive(userCoefficient, `${field}.coefficient`);
    coefficientAt = () => userCoefficient;
    coefficientSource = `Cd given by the user${spec.coefficientReason ? `: ${spec.coefficientReason}` : ''}`;
  } else if (nose === 'square-edged') {
    coefficientAt = () => SQUARE_EDGED_COEFFICIENT;
    coefficientSource = 'Square-edged broad crest, Cd = 0.848 (Bos 1989; ISO 3846) (from memory)';
  } else if (breadth !== undefined) {
    const clamp = (r: number) => Math.min(ROUND_NOSED_RANGE.max, Math.max(ROUND_NOSED_RANGE.min, r));
    coefficientAt = (energyHead) => roundNosedCoefficient(clamp(energyHead / breadth));
    coefficientSource = 'Round-nosed broad crest, Cd = 0.93 + 0.10 H/L (Bos 1989) (from memory)';
  } else {
    // Without the breadth H/L is unknown; the lowest coefficient of the range gives the highest head.
    const lowest = roundNosedCoefficient(ROUND_NOSED_RANGE.min);
    coefficientAt = () => lowest;
    coefficientSource = `Round-nosed broad crest, Cd = ${lowest} (lowest of Bos 1989's range, crest breadth not given) (from memory)`;
  }
  if (breadth === undefined) {
    notes.push('The crest breadth was not given, so the ratio H/L that the broad-crested coefficient depends on could not be checked.');
  }
  if (spec.noseShape === undefined && userCoefficient === undefined) {
    notes.push('The nose shape was not given; a square-edged crest was assumed, which gives the lower coefficient and so the higher head.');
  }
  return {
    discharge: (_h, energyHead) => coefficientAt(energyHead) * BROAD_CREST_FACTOR * b * energyHead * Math.sqrt(energyHead),
    coefficient: (_h, energyHead) => coefficientAt(energyHead),
    validity: (h, energyHead) => [...sharedChecks(h, energyHead, spec), ...ratioChecks(energyHead)],
    usesEnergyHead: true,
    coefficientSource,
    coefficientIsDefault: userCoefficient === undefined,
    coefficientForm: { symbol: 'Cd', equation: 'Q = Cd·(2/3)·√((2/3)·g)·b·H^1.5', unit: 'dimensionless' },
    submergence: broadCrestedRelation(),
    notes,
  };
}
