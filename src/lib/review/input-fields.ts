import type { ReviewPartName } from '@/lib/validation/check-schemas';

/** One leaf of a case file: its dotted path (as the case-file errors name it), the part it belongs to and its value. */
export interface InputField {
  path: string;
  part: ReviewPartName;
  value: string | number | boolean | null;
}

const PART_OF: Record<string, ReviewPartName> = {
  reach: 'channel',
  events: 'flows',
  control: 'structure',
  existingControl: 'structure',
  limits: 'limits',
  profile: 'results',
  impactThreshold: 'results',
  sizing: 'results',
  sensitivity: 'results',
};

export function partOfPath(path: string): ReviewPartName {
  return PART_OF[path.split(/[.[]/)[0]] ?? 'scheme';
}

/** Every leaf of the inputs, in file order; a list of [x, y] pairs stays one field so a survey reads as rows, not cells. */
export function flattenInputs(inputs: unknown): InputField[] {
  const fields: InputField[] = [];
  const visit = (value: unknown, path: string) => {
    if (Array.isArray(value) && value.every((v) => Array.isArray(v) && v.every((x) => typeof x === 'number'))) {
      fields.push({ path, part: partOfPath(path), value: value.map((pair) => `[${(pair as number[]).join(', ')}]`).join(' ') });
    } else if (Array.isArray(value)) {
      value.forEach((item, i) => visit(item, `${path}[${i}]`));
    } else if (value !== null && typeof value === 'object') {
      for (const [key, item] of Object.entries(value)) visit(item, path ? `${path}.${key}` : key);
    } else {
      fields.push({ path, part: partOfPath(path), value: value === undefined ? null : (value as InputField['value']) });
    }
  };
  visit(inputs, '');
  return fields;
}
