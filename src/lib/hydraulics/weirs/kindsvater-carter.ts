import type { Metres } from '../units';

/**
 * Kindsvater–Carter coefficients for a rectangular thin-plate weir, Ce = a + β·h/P, and the width
 * correction kb, against the contraction ratio b/B.
 * Kindsvater & Carter, "Discharge characteristics of rectangular thin-plate weirs",
 * J. Hydraulics Div. ASCE 83(HY6), 1957; tabulated in ISO 1438:2008 and in
 * Bos, Discharge Measurement Structures (1989), ch. 5 (rectangular sharp-crested weir).
 * The b/B = 1 row (Ce = 0.602 + 0.075 h/P, kb = −0.0009 m) is the one ISO 1438 states as an equation;
 * the other rows are digitised from memory of the published figures and should be checked against them.
 */
const CONTRACTION_TABLE: readonly { ratio: number; a: number; beta: number; kb: Metres }[] = [
  { ratio: 0.0, a: 0.587, beta: -0.0023, kb: 0.0024 },
  { ratio: 0.1, a: 0.588, beta: -0.0021, kb: 0.0024 },
  { ratio: 0.2, a: 0.589, beta: -0.0018, kb: 0.0025 },
  { ratio: 0.3, a: 0.59, beta: 0.002, kb: 0.0026 },
  { ratio: 0.4, a: 0.591, beta: 0.0058, kb: 0.0027 },
  { ratio: 0.5, a: 0.592, beta: 0.011, kb: 0.003 },
  { ratio: 0.6, a: 0.593, beta: 0.018, kb: 0.0036 },
  { ratio: 0.7, a: 0.595, beta: 0.03, kb: 0.0041 },
  { ratio: 0.8, a: 0.597, beta: 0.045, kb: 0.0042 },
  { ratio: 0.9, a: 0.599, beta: 0.064, kb: 0.0029 },
  { ratio: 1.0, a: 0.602, beta: 0.075, kb: -0.0009 },
];

/** Head correction kh for water, m (ISO 1438:2008; Kindsvater & Carter 1957). */
export const KINDSVATER_CARTER_HEAD_CORRECTION: Metres = 0.001;

function interpolateRow(contraction: number): { a: number; beta: number; kb: Metres } {
  const r = Math.min(1, Math.max(0, contraction));
  const upperIndex = CONTRACTION_TABLE.findIndex((row) => row.ratio >= r);
  if (upperIndex <= 0) return CONTRACTION_TABLE[0];
  const lower = CONTRACTION_TABLE[upperIndex - 1];
  const upper = CONTRACTION_TABLE[upperIndex];
  const t = (r - lower.ratio) / (upper.ratio - lower.ratio);
  const mix = (x: number, y: number) => x + t * (y - x);
  return { a: mix(lower.a, upper.a), beta: mix(lower.beta, upper.beta), kb: mix(lower.kb, upper.kb) };
}

/** Effective discharge coefficient Ce for contraction ratio b/B and head ratio h/P. */
export function kindsvaterCarterCoefficient(contraction: number, headOverSill: number): number {
  const row = interpolateRow(contraction);
  return row.a + row.beta * headOverSill;
}

/** Width correction kb, m, for contraction ratio b/B. */
export function kindsvaterCarterWidthCorrection(contraction: number): Metres {
  return interpolateRow(contraction).kb;
}
