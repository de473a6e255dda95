// How much the results move when the uncertain inputs are nudged.
import { EngineError, InvalidInputError, requireNonNegative } from '../errors';

export interface Perturbation {
  manningFactor: number;
  dischargeFactor: number;
  coefficientFactor: number;
  /** Routed events only: scales the reservoir's storage. */
  storageFactor?: number;
  /** Routed events only: scales the hydrograph's volume at the same peak. */
  hydrographVolumeFactor?: number;
}

export interface RunResult {
  levelsAtLimits: number[];
  extent: number;
}

export interface SensitivityPercentages {
  manningN: number;
  discharge: number;
  coefficient: number;
  /** Storage ± %, run only for a routed event. */
  storage?: number;
  /** Hydrograph volume ± %, run only for a routed event. */
  hydrographVolume?: number;
}

export const ROUTED_SENSITIVITY_DEFAULTS = { storage: 20, hydrographVolume: 20 };

export interface SensitivityCase {
  label: 'manning-n-up' | 'manning-n-down' | 'discharge-up' | 'coefficient-up' | 'coefficient-down' | 'storage-up' | 'storage-down' | 'volume-up' | 'volume-down';
  perturbation: Perturbation;
  /** Null when the engine could not compute this case; `error` then says why. */
  result: RunResult | null;
  /** Perturbed minus base, per limit. */
  levelChanges: number[] | null;
  extentChange: number | null;
  error: string | null;
}

export interface SensitivityReport {
  base: RunResult;
  cases: SensitivityCase[];
}

const UNPERTURBED: Perturbation = { manningFactor: 1, dischargeFactor: 1, coefficientFactor: 1 };

/** The storage and hydrograph-volume runs of a routed event: each up and down by its percentage. */
export function routedPlan(percentages: SensitivityPercentages): [SensitivityCase['label'], Perturbation][] {
  const s = (percentages.storage ?? ROUTED_SENSITIVITY_DEFAULTS.storage) / 100;
  const v = (percentages.hydrographVolume ?? ROUTED_SENSITIVITY_DEFAULTS.hydrographVolume) / 100;
  return [
    ['storage-up', { ...UNPERTURBED, storageFactor: 1 + s }],
    ['storage-down', { ...UNPERTURBED, storageFactor: 1 - s }],
    ['volume-up', { ...UNPERTURBED, hydrographVolumeFactor: 1 + v }],
    ['volume-down', { ...UNPERTURBED, hydrographVolumeFactor: 1 - v }],
  ];
}

/**
 * Runs the base case, then Manning's n up and down, the discharge up, and the weir coefficient up and down; for a routed
 * event also the storage and the hydrograph's volume up and down. A perturbed case the engine cannot compute is
 * reported with its error instead of stopping the study.
 */
export function sensitivity(
  run: (perturbation: Perturbation) => RunResult,
  percentages: SensitivityPercentages = { manningN: 20, discharge: 20, coefficient: 10 },
  options: { routed: boolean } = { routed: false },
): SensitivityReport {
  requireNonNegative(percentages.manningN, 'sensitivity.manningN');
  requireNonNegative(percentages.discharge, 'sensitivity.discharge');
  requireNonNegative(percentages.coefficient, 'sensitivity.coefficient');
  if (percentages.manningN >= 100) throw new InvalidInputError('sensitivity.manningN', 'must be below 100 % (n must stay above 0)');
  if (percentages.coefficient >= 100) throw new InvalidInputError('sensitivity.coefficient', 'must be below 100 % (the coefficient must stay above 0)');
  for (const key of ['storage', 'hydrographVolume'] as const) {
    const value = percentages[key];
    if (value === undefined) continue;
    requireNonNegative(value, `sensitivity.${key}`);
    if (value >= 100) throw new InvalidInputError(`sensitivity.${key}`, 'must be below 100 % (it must stay above 0)');
  }
  const base = run(UNPERTURBED);
  const n = percentages.manningN / 100;
  const q = percentages.discharge / 100;
  const c = percentages.coefficient / 100;
  const plan: [SensitivityCase['label'], Perturbation][] = [
    ['manning-n-up', { ...UNPERTURBED, manningFactor: 1 + n }],
    ['manning-n-down', { ...UNPERTURBED, manningFactor: 1 - n }],
    ['discharge-up', { ...UNPERTURBED, dischargeFactor: 1 + q }],
    ['coefficient-up', { ...UNPERTURBED, coefficientFactor: 1 + c }],
    ['coefficient-down', { ...UNPERTURBED, coefficientFactor: 1 - c }],
    ...(options.routed ? routedPlan(percentages) : []),
  ];
  return { base, cases: plan.map(([label, perturbation]) => perturbedCase(run, base, label, perturbation)) };
}

function perturbedCase(run: (p: Perturbation) => RunResult, base: RunResult, label: SensitivityCase['label'], perturbation: Perturbation): SensitivityCase {
  try {
    const result = run(perturbation);
    return {
      label,
      perturbation,
      result,
      levelChanges: result.levelsAtLimits.map((level, i) => level - base.levelsAtLimits[i]),
      extentChange: result.extent - base.extent,
      error: null,
    };
  } catch (error) {
    if (!(error instanceof EngineError)) throw error;
    return { label, perturbation, result: null, levelChanges: null, extentChange: null, error: error.message };
  }
}
