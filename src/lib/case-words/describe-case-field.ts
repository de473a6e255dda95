import type { EditableStep } from '@/lib/validation/scheme-schemas';
import { CASE_FIELDS, type CaseFieldPattern, ENGINE_ALIASES, type FieldEntry, type UnitKind } from './case-field-dictionary';
import { excerpt } from './excerpt';

export type Segment = string | number;

export interface FieldWords {
  /** The field in words, list items by their own name: "flood-level limit “Mill Lane cottages”: distance upstream". */
  label: string;
  /** Its unit in the case's units ("m", "m³/s", "%"), or null when it has none. */
  unit: string | null;
  step: EditableStep;
}

const UNITS: Record<'SI' | 'US', Record<UnitKind, string | null>> = {
  SI: { length: 'm', level: 'm above datum', depth: 'm above the bed', discharge: 'm³/s', slope: 'm/m', percent: '%', years: 'years', area: 'm²', volume: 'm³', hours: 'hours from the start', none: null },
  US: { length: 'ft', level: 'ft above datum', depth: 'ft above the bed', discharge: 'ft³/s', slope: 'ft/ft', percent: '%', years: 'years', area: 'ft²', volume: 'ft³', hours: 'hours from the start', none: null },
};

/** `events[0].discharge`, `reach.0.distanceUpstream` or `['events', 0, 'discharge']` as segments. */
export function segmentsOf(path: string | readonly PropertyKey[]): Segment[] {
  const raw: PropertyKey[] = typeof path === 'string' ? path.split(/[.[\]]/).filter((s) => s !== '') : [...path];
  if (raw.length === 1 && raw[0] === 'case') return [];
  return raw.map((s) => (typeof s === 'number' ? s : /^\d+$/.test(String(s)) ? Number(s) : String(s)));
}

const tokenOf = (s: Segment) => (typeof s === 'number' ? '[]' : s);
const patternOf = (tokens: string[]) => tokens.reduce((acc, t) => (t.startsWith('[') ? `${acc}${t}` : acc ? `${acc}.${t}` : t), '');

/** The engine's own names for a field, rewritten to the case file's (numbers kept in order). */
function canonical(segments: Segment[]): Segment[] {
  for (let n = segments.length; n > 0; n--) {
    const target = ENGINE_ALIASES[patternOf(segments.slice(0, n).map(tokenOf))];
    if (target === undefined) continue;
    const numbers = segments.slice(0, n).filter((s): s is number => typeof s === 'number');
    const rewritten = segmentsOf(target.replace(/\[\]/g, '.#')).map((s) => (s === '#' ? (numbers.shift() ?? 0) : s));
    return [...rewritten, ...segments.slice(n)];
  }
  return segments;
}

function at(value: unknown, key: Segment): unknown {
  return value !== null && typeof value === 'object' ? (value as Record<string, unknown>)[String(key)] : undefined;
}

function itemName(entry: FieldEntry, index: number, item: unknown, unit: string): string {
  const name = entry.item?.nameField ? at(item, entry.item.nameField) : undefined;
  if (typeof name === 'string' && name.trim() !== '') return `${entry.label} “${excerpt(name.trim(), 60)}”`;
  const distance = at(item, 'distanceUpstream');
  const where = entry.label === 'cross-section' && typeof distance === 'number' ? ` (${distance} ${unit} upstream)` : '';
  return `${entry.label} ${index + 1}${where}`;
}

const humanised = (key: string) => key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();

/** A case-file field in words, its unit and its wizard step; `caseFile` (when given) supplies the names of list items. */
export function describeCaseField(path: string | readonly PropertyKey[], caseFile?: unknown): FieldWords {
  const segments = canonical(segmentsOf(path));
  const units = at(caseFile, 'units') === 'US' ? 'US' : 'SI';
  const heads: string[] = [];
  let topHeading: string | null = null;
  let tokens: string[] = [];
  let value: unknown = caseFile;
  let entry: FieldEntry | undefined;
  let leaf = 'the case file';
  let step: EditableStep = 'scheme';
  segments.forEach((segment, i) => {
    const asItem = [...tokens, '[]'];
    const asPosition = [...tokens, `[${segment}]`];
    tokens = typeof segment === 'number' && CASE_FIELDS[patternOf(asPosition)] && !CASE_FIELDS[patternOf(asItem)] ? asPosition : [...tokens, tokenOf(segment)];
    value = at(value, segment);
    entry = CASE_FIELDS[patternOf(tokens)];
    step = entry?.step ?? step;
    const last = i === segments.length - 1;
    if (entry?.item && typeof segment === 'number') {
      topHeading = null;
      leaf = itemName(entry, segment, value, UNITS[units].length ?? '');
      if (!last) heads.push(leaf);
    } else {
      leaf = entry?.label ?? (typeof segment === 'number' ? `item ${segment + 1}` : humanised(segment));
      if (!last && entry?.heading && i === 0) topHeading = leaf;
    }
  });
  const unit = entry?.unit ? UNITS[units][entry.unit] : null;
  return { label: [...(topHeading ? [topHeading] : []), ...heads, leaf].join(': '), unit, step };
}

/** A field's own name, as a row heading ("Crest length"), without the part or list item it belongs to. */
export function caseFieldName(pattern: CaseFieldPattern): string {
  const label = CASE_FIELDS[pattern].label;
  return label.charAt(0).toUpperCase() + label.slice(1);
}
