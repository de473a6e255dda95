import { type Words, count, plural, text } from './event-details';

/** The plan of the parcels and restoring an earlier register. */
export const PARCEL_PLAN_WORDS: Record<string, Words> = {
  'parcels.plan-imported': (_e, d) => `uploaded a plan of the parcels from ${text(d, 'file') ?? 'a file'}${count(d, 'outlines') !== null ? ` (${plural(count(d, 'outlines') ?? 0, 'outline')})` : ''}, making plan version ${String(d.version ?? '?')}`,
  'parcels.register-restored': (_e, d) => `restored version ${String(d.restoredVersion ?? '?')} of the parcels register as version ${String(d.version ?? '?')}`,
};
