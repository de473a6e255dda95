import type { ZodType } from 'zod';

/** The word a practitioner uses for each structure field the preview may wait for (the form's labels without units). */
const STRUCTURE_FIELD_WORDS: Record<string, string> = {
  'control.kind': 'the type of structure',
  'control.crestLength': 'the crest length',
  'control.sillHeight': 'the sill height',
  'control.crestBreadth': 'the crest breadth',
  'control.coefficient': 'your own coefficient',
  'control.coefficientReason': 'the reason for your own coefficient',
};

function valueAt(value: unknown, path: readonly PropertyKey[]): unknown {
  return path.reduce<unknown>((node, key) => (node !== null && typeof node === 'object' ? (node as Record<PropertyKey, unknown>)[key] : undefined), value);
}

function withValueAt(value: unknown, path: readonly PropertyKey[], filler: unknown): unknown {
  if (path.length === 0) return filler;
  const node = value !== null && typeof value === 'object' ? (value as Record<PropertyKey, unknown>) : {};
  return { ...node, [path[0]]: withValueAt(node[path[0]], path.slice(1), filler) };
}

const isBlank = (value: unknown) => value === undefined || (typeof value === 'string' && value.trim() === '');

/**
 * The fields the preview still needs, in words: those the schema refuses while they are blank. A field typed
 * wrongly is not waited for: the server's answer names what is wrong with it. The schema checks some fields only
 * once the others pass, so blanks are filled in turn (a number, then a word) until no new one turns up.
 */
export function fieldsStillBlank(schema: ZodType, values: unknown): string[] {
  const found = new Map<string, readonly PropertyKey[]>();
  const fillers = new Map<string, number>();
  let probe = values;
  for (let round = 0; round < 12; round++) {
    const parsed = schema.safeParse(probe);
    if (parsed.success) break;
    const blanks = parsed.error.issues.filter((issue) => isBlank(valueAt(values, issue.path)));
    if (blanks.length === 0) break;
    for (const { path } of blanks) {
      const key = path.map(String).join('.');
      found.set(key, path);
      const tried = fillers.get(key) ?? 0;
      fillers.set(key, tried + 1);
      probe = withValueAt(probe, path, [1, 'given', true][tried % 3]);
    }
  }
  return [...found.keys()].map((key) => STRUCTURE_FIELD_WORDS[key] ?? `the ${(key.split('.').at(-1) ?? 'field').replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase()}`);
}

/** "the crest length, the sill height and the crest breadth". */
export function listInWords(items: string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items.at(-1)}`;
}
