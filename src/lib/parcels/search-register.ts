import type { RegisterSearch } from '@/lib/validation/register-schemas';
import type { ParcelRecord } from './parcel-record';

// The register's search, filter and sort, on the parcels of one version (at most a few thousand: done in memory).

const fold = (text: string) => text.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase();

function matches(p: ParcelRecord, words: string[]): boolean {
  const haystack = fold([p.reference, p.ownerName, p.postalAddress, p.email ?? '', p.landUse ?? ''].join(' '));
  return words.every((w) => haystack.includes(w));
}

const ORDER: Record<NonNullable<RegisterSearch['sort']>, (a: ParcelRecord, b: ParcelRecord) => number> = {
  distance: (a, b) => a.distanceFromM - b.distanceFromM || a.reference.localeCompare(b.reference),
  reference: (a, b) => a.reference.localeCompare(b.reference, 'en', { numeric: true }),
  owner: (a, b) => a.ownerName.localeCompare(b.ownerName, 'en', { sensitivity: 'base' }),
  // Parcels judged by the bank level (no ground level) come last.
  ground: (a, b) => (a.groundLevelM ?? Infinity) - (b.groundLevelM ?? Infinity) || a.reference.localeCompare(b.reference),
};

/** True when the query narrows or reorders the table, so the page shows the read-only view. */
export function isSearching(search: RegisterSearch): boolean {
  return Boolean(search.q?.trim() || search.bank || search.contact || (search.sort && search.sort !== 'distance'));
}

/** The parcels that match every given condition, in the chosen order (distance upstream by default). */
export function searchRegister(parcels: readonly ParcelRecord[], search: RegisterSearch): ParcelRecord[] {
  const words = fold(search.q ?? '').split(/\s+/).filter(Boolean);
  return parcels
    .filter((p) => matches(p, words))
    .filter((p) => !search.bank || p.bankSide === search.bank)
    .filter((p) => !search.contact || (search.contact === 'email' ? p.email !== null : p.email === null))
    .sort(ORDER[search.sort ?? 'distance']);
}
