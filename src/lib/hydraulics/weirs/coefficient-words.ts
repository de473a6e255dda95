import type { CoefficientForm } from './weir-types';

const UNIT_WORDS: Record<CoefficientForm['unit'], string> = {
  dimensionless: 'dimensionless',
  'm^½/s': 'm^½/s',
  'ft^½/s': 'ft^½/s',
  none: '',
};

/** "Cd = 0.6110 (dimensionless) in Q = Cd·(2/3)·√(2g)·b·h^1.5": a coefficient never without its form and unit. */
export function coefficientWords(value: number, form: CoefficientForm, digits = 4): string {
  if (form.unit === 'none') return form.equation;
  return `${form.symbol} = ${value.toFixed(digits)} ${form.unit === 'dimensionless' ? '(dimensionless)' : UNIT_WORDS[form.unit]} in ${form.equation}`;
}
