import { describeCaseField } from '@/lib/case-words/describe-case-field';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { ReviewPartName } from '@/lib/validation/check-schemas';
import { flattenInputs } from './input-fields';
import { keyResults, type QuantityKind } from './key-results';

export type ChangeKind = 'changed' | 'added' | 'removed';

export interface FieldChange {
  part: ReviewPartName;
  /** The case-file path of an input, or the key result's name. */
  field: string;
  /** The field in words, as the pages show it. */
  label: string;
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

function labelled(path: string, caseFile: unknown): string {
  const { label, unit } = describeCaseField(path, caseFile);
  return unit ? `${label} (${unit})` : label;
}

/** Field-by-field differences of two case files' inputs, in the order of the newer file, removals last. */
export function inputChanges(previous: unknown, current: unknown): FieldChange[] {
  const before = new Map(flattenInputs(previous).map((f) => [f.path, f]));
  const after = flattenInputs(current);
  const changes: FieldChange[] = [];
  for (const field of after) {
    const old = before.get(field.path);
    if (old === undefined || old.value !== field.value) changes.push({ part: field.part, field: field.path, label: labelled(field.path, current), before: old?.value ?? null, after: field.value, change: kindOf(old, field), kind: 'none' });
    before.delete(field.path);
  }
  for (const old of before.values()) changes.push({ part: old.part, field: old.path, label: labelled(old.path, previous), before: old.value, after: null, change: 'removed', kind: 'none' });
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
    if (!same) changes.push({ part: 'results', field: row.label, label: row.label, before: old?.value ?? null, after: row.value, change: kindOf(old, row), kind: row.kind });
  }
  for (const old of before.values()) changes.push({ part: 'results', field: old.label, label: old.label, before: old.value, after: null, change: 'removed', kind: old.kind });
  return changes;
}
