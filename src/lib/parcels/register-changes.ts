import type { ParcelInput } from '@/lib/validation/parcel-schemas';

export interface RegisterChanges {
  added: string[];
  removed: string[];
  changed: string[];
}

type Comparable = Pick<ParcelInput, 'reference'> & Partial<Record<keyof ParcelInput, unknown>>;

const COMPARED = ['ownerName', 'postalAddress', 'email', 'distanceFromM', 'distanceToM', 'bankSide', 'groundLevelM', 'landUse'] as const satisfies readonly (keyof ParcelInput)[];
const norm = (v: unknown) => (v === null || v === undefined ? '' : String(v));

/** Which parcel references a register version added, removed or changed relative to the version before it. */
export function registerChanges(before: readonly Comparable[], after: readonly Comparable[]): RegisterChanges {
  const key = (p: Comparable) => p.reference.trim().toLowerCase();
  const old = new Map(before.map((p) => [key(p), p]));
  const next = new Map(after.map((p) => [key(p), p]));
  return {
    added: after.filter((p) => !old.has(key(p))).map((p) => p.reference),
    removed: before.filter((p) => !next.has(key(p))).map((p) => p.reference),
    changed: after.filter((p) => {
      const o = old.get(key(p));
      return o !== undefined && COMPARED.some((f) => norm(o[f]) !== norm(p[f]));
    }).map((p) => p.reference),
  };
}

/** The register's fields in words, as the history names what a version changed. */
export const PARCEL_FIELD_WORDS: Record<(typeof COMPARED)[number], string> = {
  ownerName: 'owner or occupier',
  postalAddress: 'postal address',
  email: 'e-mail',
  distanceFromM: 'distance from',
  distanceToM: 'distance to',
  bankSide: 'bank',
  groundLevelM: 'ground level',
  landUse: 'land use',
};

export interface ParcelFieldChanges {
  reference: string;
  fields: string[];
}

/** For each parcel in both versions whose details differ, which fields changed, in words. */
export function changedFields(before: readonly Comparable[], after: readonly Comparable[]): ParcelFieldChanges[] {
  const key = (p: Comparable) => p.reference.trim().toLowerCase();
  const old = new Map(before.map((p) => [key(p), p]));
  return after.flatMap((p) => {
    const o = old.get(key(p));
    const fields = o === undefined ? [] : COMPARED.filter((f) => norm(o[f]) !== norm(p[f])).map((f) => PARCEL_FIELD_WORDS[f]);
    return fields.length ? [{ reference: p.reference, fields }] : [];
  });
}
