import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { ReviewPartName } from '@/lib/validation/check-schemas';
import { flattenInputs } from './input-fields';
import { keyResults, type QuantityKind } from './key-results';

export type ChangeKind = 'changed' | 'added' | 'removed';

export interface FieldChange {
  part: ReviewPartName;
  field: string;
  before: string | number | boolean | null;
  after: string | number | boolean | null;
  change: ChangeKind;
  kind: QuantityKind;
}

function kindOf(before: unknown, after: unknown): ChangeKind {
  if (before === undefined) return 'added';
  if (after === undefined) return 'removed';
  return 'changed';
}

/** Field-by-field differences of two case files' inputs, in the order of the newer file, removals last. */
export function inputChanges(previous: unknown, current: unknown): FieldChange[] {
  const before = new Map(flattenInputs(previous).map((f) => [f.path, f]));
  const after = flattenInputs(current);
  const changes: FieldChange[] = [];
  for (const field of after) {
    const old = before.get(field.path);
    if (old === undefined || old.value !== field.value) changes.push({ part: field.part, field: field.path, before: old?.value ?? null, after: field.value, change: kindOf(old, field), kind: 'none' });
    before.delete(field.path);
  }
  for (const old of before.values()) changes.push({ part: old.part, field: old.path, before: old.value, after: null, change: 'removed', kind: 'none' });
  return changes;
}

/**
 * Differences of the headline results. Numbers count as equal within `tolerance` (absolute), so comparing a re-run
 * with the stored results can use 0 and comparing two revisions can ignore the last digits of a float.
 */
export function resultChanges(previous: CaseResult, current: CaseResult, tolerance = 0): FieldChange[] {
  const before = new Map(keyResults(previous).map((r) => [r.key, r]));
  const changes: FieldChange[] = [];
  for (const row of keyResults(current)) {
    const old = before.get(row.key);
    before.delete(row.key);
    const same = old !== undefined && (typeof old.value === 'number' && typeof row.value === 'number' ? Math.abs(old.value - row.value) <= tolerance : old.value === row.value);
    if (!same) changes.push({ part: 'results', field: row.label, before: old?.value ?? null, after: row.value, change: kindOf(old, row), kind: row.kind });
  }
  for (const old of before.values()) changes.push({ part: 'results', field: old.label, before: old.value, after: null, change: 'removed', kind: old.kind });
  return changes;
}
