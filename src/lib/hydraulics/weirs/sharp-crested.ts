import { InvalidInputError, requirePositive } from '../errors';
import { GRAVITY, type Metres } from '../units';
import {
  KINDSVATER_CARTER_HEAD_CORRECTION,
  kindsvaterCarterCoefficient,
  kindsvaterCarterWidthCorrection,
} from './kindsvater-carter';
import { villemonteRelation } from './submergence';
import { check, type CoefficientForm, type FreeFlowRating, type WeirSpec } from './weir-types';

// Thin-plate rectangular weir in coefficient form Q = (2/3)·Cd·√(2g)·b·h^1.5
// (Henderson, Open Channel Flow (1966), ch. 6 (from memory); Chow, Open-Channel Hydraulics (1959), ch. 14 (from memory)).
const THIN_PLATE_FACTOR = (2 / 3) * Math.sqrt(2 * GRAVITY);

const THIN_PLATE_FORM: CoefficientForm = { symbol: 'Cd', equation: 'Q = Cd·(2/3)·√(2g)·b·h^1.5', unit: 'dimensionless' };
const KINDSVATER_CARTER_FORM: CoefficientForm = { symbol: 'Ce', equation: 'Q = Ce·(2/3)·√(2g)·be·he^1.5', unit: 'dimensionless' };

/** Rehbock's coefficient as quoted by Henderson (1966) (from memory): Cd = 0.611 + 0.08 h/P. */
export function rehbockCoefficient(head: Metres, sillHeight: Metres): number {
  return 0.611 + 0.08 * (head / sillHeight);
}

/**
 * Rating of a rectangular thin-plate weir. With a channel width the Kindsvater–Carter method applies
 * (ISO 1438:2008), covering contracted and full-width weirs; without one the weir spans the channel and
 * Rehbock's coefficient applies. Both coefficients were fitted to the measured head h and carry the
 * approach velocity in their h/P term, so their equations use h, not the energy head.
 */
export function sharpCrestedRating(spec: WeirSpec, field: string): FreeFlowRating {
  const b = spec.crestLength;
  const p = spec.sillHeight;
  const userCoefficient = spec.coefficient;
  if (userCoefficient !== undefined) {
    requirePositive(userCoefficient, `${field}.coefficient`);
    return {
      discharge: (_h, energyHead) => THIN_PLATE_FACTOR * userCoefficient * b * energyHead * Math.sqrt(energyHead),
      coefficient: () => userCoefficient,
      validity: (h) => [check('head (m)', h, 0.03), check('sill height (m)', p, 0.1), check('crest length (m)', b, 0.15)],
      usesEnergyHead: true,
      coefficientSource: `Cd given by the user${spec.coefficientReason ? `: ${spec.coefficientReason}` : ''}`,
      coefficientIsDefault: false,
      coefficientForm: { ...THIN_PLATE_FORM, equation: 'Q = Cd·(2/3)·√(2g)·b·H^1.5' },
      submergence: villemonteRelation(),
      notes: [],
    };
  }
  const notes: string[] = [];
  if (spec.channelWidth === undefined) {
    return {
      discharge: (h) => THIN_PLATE_FACTOR * rehbockCoefficient(h, p) * b * h * Math.sqrt(h),
      coefficient: (h) => rehbockCoefficient(h, p),
      // Rehbock's formula is usually quoted as good up to h/P ≈ 5 (Henderson 1966, from memory).
      validity: (h) => [check('head (m)', h, 0.03), check('head / sill height', h / p, 0, 5), check('sill height (m)', p, 0.1)],
      usesEnergyHead: false,
      coefficientSource: 'Rehbock, Cd = 0.611 + 0.08 h/P (as quoted by Henderson 1966, from memory)',
      coefficientIsDefault: true,
      coefficientForm: THIN_PLATE_FORM,
      submergence: villemonteRelation(),
      notes,
    };
  }
  requirePositive(spec.channelWidth, `${field}.channelWidth`);
  const channelWidth = spec.channelWidth;
  if (b > channelWidth * (1 + 1e-9)) {
    throw new InvalidInputError(`${field}.crestLength`, `must not exceed the channel width (${channelWidth} m) for a sharp-crested weir`);
  }
  const contraction = b / channelWidth;
  const effectiveWidth = b + kindsvaterCarterWidthCorrection(contraction);
  const coefficientAt = (h: Metres) => kindsvaterCarterCoefficient(contraction, h / p);
  const isContracted = contraction < 1 - 1e-9;
  return {
    // ISO 1438:2008: Q = Ce·(2/3)·√(2g)·be·he^1.5 with be = b + kb, he = h + kh.
    discharge: (h) => THIN_PLATE_FACTOR * coefficientAt(h) * effectiveWidth * (h + KINDSVATER_CARTER_HEAD_CORRECTION) ** 1.5,
    coefficient: coefficientAt,
    // Limits of the method per ISO 1438:2008 / Bos (1989) (from memory).
    validity: (h) => [
      check('head (m)', h, 0.03),
      check('head / sill height', h / p, 0, 2.5),
      check('sill height (m)', p, 0.1),
      check('crest length (m)', b, 0.15),
      ...(isContracted ? [check('side clearance (B − b)/2 (m)', (channelWidth - b) / 2, 0.1)] : []),
    ],
    usesEnergyHead: false,
    coefficientSource: `Kindsvater–Carter, b/B = ${contraction.toFixed(3)} (ISO 1438:2008; contracted rows digitised from memory)`,
    coefficientIsDefault: true,
    coefficientForm: KINDSVATER_CARTER_FORM,
    submergence: villemonteRelation(),
    notes,
  };
}
