import type { Parcel } from '@/lib/db';
import type { ParcelInput } from '@/lib/validation/parcel-schemas';

/** A parcel as pages and letters use it. Owner name, address and e-mail are personal data: load only after an access check. */
export interface ParcelRecord {
  id: string;
  reference: string;
  ownerName: string;
  postalAddress: string;
  email: string | null;
  distanceFromM: number;
  distanceToM: number;
  bankSide: 'left' | 'right' | 'both';
  groundLevelM: number | null;
  landUse: string | null;
}

export function parcelRecord(p: Parcel): ParcelRecord {
  return {
    id: p.id,
    reference: p.reference,
    ownerName: p.ownerName,
    postalAddress: p.postalAddress,
    email: p.email,
    distanceFromM: p.distanceFromM,
    distanceToM: p.distanceToM,
    bankSide: p.bankSide,
    groundLevelM: p.groundLevelM,
    landUse: p.landUse,
  };
}

/** The columns of a new parcel row from the shared schema's output (empty texts are stored as null). */
export function parcelColumns(input: ParcelInput) {
  return {
    reference: input.reference,
    ownerName: input.ownerName,
    postalAddress: input.postalAddress,
    email: input.email === '' ? null : input.email,
    distanceFromM: input.distanceFromM,
    distanceToM: input.distanceToM,
    bankSide: input.bankSide,
    groundLevelM: input.groundLevelM,
    landUse: input.landUse === '' ? null : input.landUse,
  };
}

/** The editable form of a stored parcel (null texts as empty strings), the shape the table editor's schema takes. */
export function parcelInputOf(p: ParcelRecord): ParcelInput {
  return { ...p, email: p.email ?? '', landUse: p.landUse ?? '' };
}
