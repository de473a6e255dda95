import type { ParcelInput } from '@/lib/validation/parcel-schemas';

export interface RegisterChanges {
  added: string[];
  removed: string[];
  changed: string[];
}

type Comparable = Pick<ParcelInput, 'reference'> & Partial<Record<keyof ParcelInput, unknown>>;

const COMPARED: (keyof ParcelInput)[] = ['ownerName', 'postalAddress', 'email', 'distanceFromM', 'distanceToM', 'bankSide', 'groundLevelM', 'landUse'];
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
