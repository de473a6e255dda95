import { METRES_PER_FOOT } from '../units';

type Curve = readonly (readonly [x: number, y: number])[];

/** Linear interpolation in a curve sorted by x; clamps to the end values outside it. */
export function interpolateCurve(curve: Curve, x: number): number {
  if (x <= curve[0][0]) return curve[0][1];
  const last = curve[curve.length - 1];
  if (x >= last[0]) return last[1];
  const upper = curve.findIndex(([cx]) => cx >= x);
  const [x0, y0] = curve[upper - 1];
  const [x1, y1] = curve[upper];
  return y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
}

/** A coefficient of Q = C·L·H^1.5 in ft^0.5/s becomes m^0.5/s on multiplying by √(0.3048). */
const US_TO_SI_WEIR_COEFFICIENT = Math.sqrt(METRES_PER_FOOT);

// Design coefficient C₀ (US units, ft^0.5/s) against P/Hd for a vertical upstream face,
// digitised from memory of USBR, Design of Small Dams, 3rd ed. (1987), Fig. 9-23. Flat beyond P/Hd = 3.
const DESIGN_COEFFICIENT_US: Curve = [
  [0, 3.08], [0.1, 3.35], [0.2, 3.5], [0.3, 3.61], [0.4, 3.69], [0.5, 3.75], [0.6, 3.79],
  [0.8, 3.85], [1.0, 3.89], [1.5, 3.93], [2.0, 3.94], [3.0, 3.95],
];

// Ratio C/C₀ against He/Hd, digitised from memory of USBR, Design of Small Dams, 3rd ed. (1987), Fig. 9-24.
const HEAD_RATIO_FACTOR: Curve = [
  [0.05, 0.8], [0.1, 0.82], [0.2, 0.85], [0.4, 0.9], [0.6, 0.94], [0.8, 0.975], [1.0, 1.0],
  [1.2, 1.02], [1.4, 1.035], [1.6, 1.045],
];

export const OGEE_HEAD_RATIO_RANGE = { min: 0.05, max: 1.6 };

/** Design-head coefficient C₀ in SI units (m^0.5/s) for approach depth over design head P/Hd. */
export function ogeeDesignCoefficient(sillOverDesignHead: number): number {
  return interpolateCurve(DESIGN_COEFFICIENT_US, sillOverDesignHead) * US_TO_SI_WEIR_COEFFICIENT;
}

/** Factor C/C₀ for heads other than the design head, He/Hd. */
export function ogeeHeadRatioFactor(headOverDesignHead: number): number {
  return interpolateCurve(HEAD_RATIO_FACTOR, headOverDesignHead);
}

// Pier and abutment contraction coefficients, USBR (1987) §9 (from memory).
export const PIER_COEFFICIENTS = { squareNosed: 0.02, roundNosed: 0.01, pointedNosed: 0 } as const;
export const ABUTMENT_COEFFICIENTS = { squareHeadwall: 0.2, roundedSmallRadius: 0.1, roundedLargeRadius: 0 } as const;
