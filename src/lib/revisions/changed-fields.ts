import { dottedPath } from '@/lib/http/zod-issues';

const MAX_LISTED = 40;

function leaves(value: unknown, path: (string | number)[], out: Map<string, string>): void {
  if (Array.isArray(value)) {
    if (value.length === 0) out.set(dottedPath(path), '[]');
    value.forEach((v, i) => leaves(v, [...path, i], out));
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) leaves(v, [...path, k], out);
  } else if (value !== undefined) {
    out.set(dottedPath(path), JSON.stringify(value));
  }
}

/** The dotted paths whose values differ between two versions of a draft, for the revision history ("what changed"). */
export function changedFields(before: unknown, after: unknown): string[] {
  const a = new Map<string, string>();
  const b = new Map<string, string>();
  leaves(before, [], a);
  leaves(after, [], b);
  const changed = [...new Set([...a.keys(), ...b.keys()])].filter((k) => a.get(k) !== b.get(k)).sort();
  return changed.length > MAX_LISTED ? [...changed.slice(0, MAX_LISTED), `… and ${changed.length - MAX_LISTED} more`] : changed;
}
