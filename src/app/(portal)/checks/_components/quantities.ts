import { valueInWords } from '@/lib/case-words/value-words';
import type { QuantityKind } from '@/lib/review/key-results';

// Numbers as the pages show them: fixed decimals in the tabular face, always with their unit.

export function unitsOf(units: 'SI' | 'US' | undefined): { length: string; discharge: string } {
  return units === 'US' ? { length: 'ft', discharge: 'ft³/s' } : { length: 'm', discharge: 'm³/s' };
}

export function quantity(value: number | null | undefined, unit: string, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return `${value.toFixed(digits)} ${unit}`;
}

/** A compared value (a key result or an input field) in words and numbers. */
export function shownValue(value: string | number | boolean | null, kind: QuantityKind, units: 'SI' | 'US' | undefined): string {
  if (value === null) return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string') return valueInWords(value);
  const u = unitsOf(units);
  if (kind === 'length') return quantity(value, u.length);
  if (kind === 'discharge') return quantity(value, u.discharge, 2);
  return String(value);
}
