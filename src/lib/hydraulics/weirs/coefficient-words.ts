import type { CoefficientForm } from './weir-types';

const UNIT_WORDS: Record<CoefficientForm['unit'], string> = {
  dimensionless: 'dimensionless',
  'm^½/s': 'm^½/s',
  'ft^½/s': 'ft^½/s',
  none: '',
};

/** "Cd = 0.6110 (dimensionless) in Q = Cd·(2/3)·√(2g)·b·h^1.5": a coefficient never without its form and unit. */
export function coefficientWords(value: number, form: CoefficientForm | undefined, digits = 4): string {
  // Results stored by engine version 0.1.0 did not record the form.
  if (form === undefined) return `coefficient ${value.toFixed(digits)} (its equation form was not recorded by engine version 0.1.0, which computed it)`;
  if (form.unit === 'none') return form.equation;
  return `${form.symbol} = ${value.toFixed(digits)} ${form.unit === 'dimensionless' ? '(dimensionless)' : UNIT_WORDS[form.unit]} in ${form.equation}`;
}
