import type { FieldErrors, FieldValues } from 'react-hook-form';

/** For register(…, { setValueAs }): blank is "not given"; anything else is read as a number (NaN is refused by the schema, with its unit). */
export function asNumber(value: unknown): number | undefined {
  if (value === '' || value === null || value === undefined) return undefined;
  if (typeof value === 'number') return value;
  const text = String(value).trim();
  return text === '' ? undefined : Number(text);
}

/** Text inputs for numbers, so "abc" reaches the schema and gets a message in words rather than being silently dropped. */
export const numberInputProps = { type: 'text', inputMode: 'decimal', autoComplete: 'off', spellCheck: false } as const;

/** The message at a dotted path ("section.width", "events.0.discharge") of react-hook-form's nested errors. */
export function errorAt<T extends FieldValues>(errors: FieldErrors<T>, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.replace(/\[(\d+)\]/g, '.$1').split('.')) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  const message = node && typeof node === 'object' && 'message' in node ? (node as { message?: unknown }).message : undefined;
  return typeof message === 'string' && message !== '' ? message : undefined;
}

/** The server's dotted paths ("events[1].discharge") in react-hook-form's form ("events.1.discharge"). */
export function formPath(path: string): string {
  return path.replace(/\[(\d+)\]/g, '.$1');
}

/** Drops undefined, empty strings and empty objects, so optional parts the designer left blank are not sent at all. */
export function pruned<T>(value: T): T {
  if (Array.isArray(value)) return value.map(pruned) as T;
  if (value === null || typeof value !== 'object') return value;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) {
    const p = pruned(v);
    if (p === undefined || p === '' || (p !== null && typeof p === 'object' && !Array.isArray(p) && Object.keys(p).length === 0)) continue;
    out[k] = p;
  }
  return out as T;
}
