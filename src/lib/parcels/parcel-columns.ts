import type { ParcelInput } from '@/lib/validation/parcel-schemas';

// The columns of the parcels CSV, shared by the parser and the upload page (which must not load the CSV parser).

export const PARCEL_COLUMNS = {
  parcel_reference: 'reference',
  owner_name: 'ownerName',
  postal_address: 'postalAddress',
  email: 'email',
  distance_from_m: 'distanceFromM',
  distance_to_m: 'distanceToM',
  bank_side: 'bankSide',
  ground_level_m: 'groundLevelM',
  land_use: 'landUse',
} as const satisfies Record<string, keyof ParcelInput>;

export type ParcelColumn = keyof typeof PARCEL_COLUMNS;
export const OPTIONAL_COLUMNS: ParcelColumn[] = ['email', 'ground_level_m', 'land_use'];

export interface CsvIssue {
  /** Line in the file, counting the header as line 1. */
  line: number;
  column: ParcelColumn | null;
  message: string;
}
