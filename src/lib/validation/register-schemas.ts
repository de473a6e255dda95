import { z } from 'zod';
import { BANK_SIDES } from './parcel-schemas';
import { multiLineText, singleLineText } from './plain-text';

// The register's history and its search: restoring an earlier version, and the search, filter and sort of the table.

const id = (what: string) => z.string({ error: `is required (${what})` }).trim().min(1, `is required (${what})`).max(64, `is not a valid id (${what})`);

export const restoreRegisterSchema = z.object({
  schemeId: id('the scheme'),
  /** The version shown as current when the history was loaded; a newer one saved meanwhile makes this a conflict. */
  baseRegisterId: id('the current register version'),
  note: multiLineText('the note on this version').max(300, 'must be at most 300 characters (the note on this version)'),
  version: z.number({ error: 'must be a whole number from 1 (the version to restore)' }).int({ error: 'must be a whole number from 1 (the version to restore)' }).min(1, { error: 'must be a whole number from 1 (the version to restore)' }).max(999_999, { error: 'must be at most 999999 (the version to restore)' }),
});
export type RestoreRegisterInput = z.infer<typeof restoreRegisterSchema>;

export const REGISTER_SORTS = { distance: 'Distance upstream', reference: 'Parcel reference', owner: 'Owner or occupier', ground: 'Ground level' } as const;
export const CONTACT_FILTERS = { email: 'By e-mail', post: 'By post only' } as const;

/** A choice left at "any" arrives as an empty parameter: it means no condition. */
const optionalChoice = <T extends z.ZodType>(schema: T) => z.preprocess((v) => (v === '' ? undefined : v), schema.optional());

/** The register page's query: search words, a bank side, how the owner is reached, and the order. */
export const registerSearchSchema = z.object({
  q: singleLineText('the search words').max(100, 'must be at most 100 characters (the search words)').optional(),
  bank: optionalChoice(z.enum(BANK_SIDES, { error: 'must be left, right or both (the bank)' })),
  contact: optionalChoice(z.enum(Object.keys(CONTACT_FILTERS) as [keyof typeof CONTACT_FILTERS], { error: 'must be email or post (how the owner is reached)' })),
  sort: optionalChoice(z.enum(Object.keys(REGISTER_SORTS) as [keyof typeof REGISTER_SORTS], { error: 'must be distance, reference, owner or ground (the order)' })),
});
export type RegisterSearch = z.infer<typeof registerSearchSchema>;
