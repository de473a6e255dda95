import { z } from 'zod';
import { multiLineText, singleLineText } from './plain-text';
import { MAX_PARCELS } from './input-limits';

// Parcels register: one schema for a parcel, used by the CSV import (row by row), the table editor's form and the server.

export const BANK_SIDES = ['left', 'right', 'both'] as const;
export { MAX_PARCELS };
/** Longest reach a parcel may lie along, 100 km upstream of the control: beyond it a distance is a typing error. */
export const MAX_DISTANCE_M = 100_000;

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;
const id = z.string().trim().min(1, 'is required').max(64, 'is not a valid id');
const metres = (what: string) =>
  z
    .number({ error: (i) => (i.input === undefined || i.input === null ? `is required (${what}, m)` : `must be a number of metres (${what})`) })
    .refine(Number.isFinite, { error: `must be a finite number of metres (${what})` });

export const parcelSchema = z
  .object({
    reference: singleLineText('the parcel reference').min(1, 'is required (the parcel reference, e.g. HM-07)').max(40, 'must be at most 40 characters'),
    ownerName: singleLineText('owner or occupier name').min(1, 'is required (owner or occupier name)').max(200, 'must be at most 200 characters'),
    postalAddress: multiLineText('postal address for the letter').min(1, 'is required (postal address for the letter)').max(500, 'must be at most 500 characters'),
    /** Empty when the owner has no e-mail: the letter is then printed and posted. */
    email: singleLineText('the owner’s e-mail address').max(254, 'must be at most 254 characters').refine((v) => v === '' || EMAIL.test(v), { error: 'must be an e-mail address like name@example.org, or empty' }),
    distanceFromM: metres('distance upstream where the parcel starts').min(0, { error: 'must be 0 m or more (distance upstream of the control)' }).max(MAX_DISTANCE_M, { error: `must be at most ${MAX_DISTANCE_M} m` }),
    distanceToM: metres('distance upstream where the parcel ends').min(0, { error: 'must be 0 m or more (distance upstream of the control)' }).max(MAX_DISTANCE_M, { error: `must be at most ${MAX_DISTANCE_M} m` }),
    bankSide: z.enum(BANK_SIDES, { error: 'must be left, right or both (looking downstream)' }),
    /** Lowest ground level of the parcel, m above datum; empty to judge flooding by the bank level of the case. */
    groundLevelM: metres('lowest ground level of the parcel').min(-500, { error: 'must be at least -500 m' }).max(9000, { error: 'must be at most 9000 m' }).nullable(),
    landUse: singleLineText('land use').max(120, 'must be at most 120 characters'),
  })
  .refine((p) => p.distanceToM > p.distanceFromM, {
    path: ['distanceToM'],
    error: (issue) => `must be greater than the distance from (${(issue.input as { distanceFromM: number }).distanceFromM} m)`,
    // Checked even when other fields of the row are wrong, as long as both distances are numbers.
    when: ({ value }) => {
      const v = value as { distanceFromM?: unknown; distanceToM?: unknown };
      return Number.isFinite(v?.distanceFromM) && Number.isFinite(v?.distanceToM);
    },
  });
export type ParcelInput = z.infer<typeof parcelSchema>;

function uniqueReferences(parcels: { reference: string }[], ctx: z.RefinementCtx): void {
  const seen = new Map<string, number>();
  parcels.forEach((p, i) => {
    const key = p.reference.trim().toLowerCase();
    const first = seen.get(key);
    if (first !== undefined) ctx.addIssue({ code: 'custom', path: ['parcels', i, 'reference'], message: `repeats the reference of row ${first + 1} (${p.reference})` });
    else seen.set(key, i);
  });
}

export const saveParcelsSchema = z
  .object({
    schemeId: id,
    /** The register version the edits start from; a newer one saved meanwhile makes this a conflict. */
    baseRegisterId: id,
    note: multiLineText('the note on this version').max(300, 'must be at most 300 characters'),
    parcels: z.array(parcelSchema).min(1, 'must keep at least one parcel').max(MAX_PARCELS, `must have at most ${MAX_PARCELS} parcels`),
  })
  .superRefine((v, ctx) => uniqueReferences(v.parcels, ctx));
export type SaveParcelsInput = z.infer<typeof saveParcelsSchema>;
