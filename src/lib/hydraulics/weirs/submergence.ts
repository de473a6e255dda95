import type { Metres } from '../units';
import type { SubmergenceState } from './weir-types';

/** Exponent n of the free-flow rating Q ∝ H^n; 1.5 for a rectangular weir (Villemonte 1947). */
export const RECTANGULAR_WEIR_EXPONENT = 1.5;

/**
 * Above this tailwater-to-headwater ratio a submergence relation runs past its data: Villemonte's (1947) tests and
 * Bos's (1989) drowned-flow curves stop near 0.95, and even inside the data the corrections scatter by about ±15 %
 * in discharge (USBR, Water Measurement Manual, 3rd ed. 2001, ch. 7 §15). The result is still computed and warned.
 */
export const SUBMERGENCE_DATA_LIMIT = 0.95;

/**
 * How a structure's discharge falls when the water downstream stands above its crest. Heads are over the crest:
 * h the measured upstream head, H the upstream energy head, h₂ the downstream head.
 */
export interface SubmergenceRelation {
  /** The relation's name and published source, for the methods list. */
  name: string;
  /** The submergence ratio as the relation defines it (h₂/h₁ or h₂/H₁). */
  ratio(head: Metres, energyHead: Metres, tailwaterHead: Metres): number;
  /** Qs/Q, the submerged discharge as a fraction of the free discharge at the same upstream head. */
  factor(head: Metres, energyHead: Metres, tailwaterHead: Metres): number;
  /** Ratio up to which the flow is modular (factor 1). */
  modularLimit: number;
  /** Which way the relation errs when extrapolated past its data. */
  extrapolationNote: string;
}

/**
 * Villemonte's submerged-flow reduction Qs/Q = (1 − (H₂/H₁)^n)^0.385 with the measured heads
 * (Villemonte, "Submerged-weir discharge studies", Engineering News-Record, 1947).
 */
export function villemonteFactor(ratio: number, exponent: number = RECTANGULAR_WEIR_EXPONENT): number {
  if (ratio <= 0) return 1;
  if (ratio >= 1) return 0;
  return (1 - ratio ** exponent) ** 0.385;
}

// Villemonte's Δh = h₁ − h₂ falls as h₂^-2.9 at a given discharge as r → 1, faster than a local loss (∝ V², i.e. h₂^-2):
// extrapolated, it tends to understate the level difference across the structure (Villemonte 1947's form, worked out).
const VILLEMONTE_EXTRAPOLATION =
  'extrapolated, the relation tends to understate the level difference across the structure, so the afflux may be too low: treat it as a lower bound';

/** Villemonte (1947) with the exponent n of the structure's free-flow rating (a constant, or read off a rating table). */
export function villemonteRelation(exponentAt: (head: Metres) => number = () => RECTANGULAR_WEIR_EXPONENT, label = 'n = 1.5'): SubmergenceRelation {
  return {
    name: `Villemonte (1947), Qs/Q = (1 − (h₂/h₁)^n)^0.385, ${label}`,
    ratio: (head, _energyHead, tailwater) => (head > 0 ? tailwater / head : tailwater > 0 ? 1 : 0),
    factor: (head, _energyHead, tailwater) => (tailwater <= 0 ? 1 : head > 0 ? villemonteFactor(tailwater / head, exponentAt(head)) : 0),
    modularLimit: 0,
    extrapolationNote: VILLEMONTE_EXTRAPOLATION,
  };
}

/** Broad-crested modular limit h₂/H₁ = 2/3: the critical depth on the crest is 2H/3 (Bos 1989, ch. 1; about 0.66 for a vertical downstream face — from memory). */
export const BROAD_CRESTED_MODULAR_LIMIT = 2 / 3;

/**
 * Drowned flow over a broad crest. With the tailwater above the critical depth on the crest, the depth on the crest is
 * the downstream head h₂ and the energy equation over the crest gives Q = Cd·b·h₂·√(2g(H₁ − h₂)) (Bos, Discharge
 * Measurement Structures, 1989, §1.9, drowned flow; Henderson, Open Channel Flow, 1966, §6.5 — both from memory).
 * Divided by the modular Q = Cd·(2/3)^1.5·√g·b·H₁^1.5, the reduction factor is f = r√(1 − r) / ((2/3)√(1/3)) with
 * r = h₂/H₁, which is 1 at the modular limit r = 2/3 and falls to 0 at r = 1.
 */
export function broadCrestedDrownedFactor(ratio: number): number {
  if (ratio <= BROAD_CRESTED_MODULAR_LIMIT) return 1;
  if (ratio >= 1) return 0;
  return (ratio * Math.sqrt(1 - ratio)) / ((2 / 3) * Math.sqrt(1 / 3));
}

export function broadCrestedRelation(): SubmergenceRelation {
  return {
    name: 'drowned broad crest, Q = Cd·b·h₂·√(2g(H₁ − h₂)) above the modular limit h₂/H₁ = 2/3 (Bos 1989)',
    ratio: (_head, energyHead, tailwater) => (energyHead > 0 ? tailwater / energyHead : tailwater > 0 ? 1 : 0),
    factor: (_head, energyHead, tailwater) => (tailwater <= 0 ? 1 : energyHead > 0 ? broadCrestedDrownedFactor(tailwater / energyHead) : 0),
    modularLimit: BROAD_CRESTED_MODULAR_LIMIT,
    extrapolationNote:
      // The level recovers a little where the flow leaves the crest, so the depth on the crest is slightly below h₂;
      // taking it as h₂ asks for more upstream head (worked out from the relation's form).
      'extrapolated, it takes the depth on the crest as the downstream head, neglecting the small recovery of level below the crest, which errs towards a higher upstream level; the result is sensitive to the downstream level there',
  };
}

/** Downstream head over the crest, m, from the downstream depth above the bed and the sill height. */
export function tailwaterHead(tailwaterDepth: Metres, sillHeight: Metres): Metres {
  return Math.max(0, tailwaterDepth - sillHeight);
}

export function submergenceState(relation: SubmergenceRelation, head: Metres, energyHead: Metres, tailwater: Metres): SubmergenceState {
  const ratio = relation.ratio(head, energyHead, tailwater);
  return {
    tailwaterHead: tailwater,
    ratio,
    factor: relation.factor(head, energyHead, tailwater),
    relation: relation.name,
    modular: ratio <= relation.modularLimit,
    extrapolated: ratio > SUBMERGENCE_DATA_LIMIT,
  };
}

/** The warnings a submerged structure's result carries. */
export function submergenceWarnings(relation: SubmergenceRelation, state: SubmergenceState): string[] {
  if (state.tailwaterHead <= 0) return [];
  if (state.modular) {
    return [`The water downstream stands ${state.tailwaterHead.toFixed(3)} m above the crest, within the modular limit (ratio ${state.ratio.toFixed(3)} ≤ ${relation.modularLimit.toFixed(2)}): the flow over the crest is free.`];
  }
  const warnings = [`The structure is submerged (ratio ${state.ratio.toFixed(3)}): it passes ${(state.factor * 100).toFixed(1)} % of its free discharge at the same head, by ${relation.name}.`];
  if (state.extrapolated) {
    warnings.push(`The submergence ratio ${state.ratio.toFixed(3)} is above ${SUBMERGENCE_DATA_LIMIT}, past the data of the relation; ${relation.extrapolationNote}.`);
  }
  return warnings;
}
