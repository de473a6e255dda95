import { z } from 'zod';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { calendarDateIn } from '@/lib/dates/calendar-dates';
import { MAX_PARCELS } from './input-limits';
import { isoDateText } from './iso-date';
import { unknownPlaceholderMessage, unknownPlaceholders } from './letter-placeholders';
import { multiLineText } from './plain-text';

// Letters to landowners: the template's free-text paragraphs, generating, sending and logging responses.

/**
 * A day no later than today in the portal's zone (just after midnight in summer, today there is tomorrow in UTC). In
 * the browser the setting is not readable, so the default zone is used there; the server's check is the one that counts.
 */
const notAfterToday = (isoDate: string) => isoDate <= calendarDateIn(portalTimeZone(), new Date());

const id = z.string().trim().min(1, 'is required').max(64, 'is not a valid id');
/** A level, depth, distance or flow typed into the free text would go out unchecked: the letter's numbers come from the engine. */
const QUANTITY = /\d\s*(mm|cm|km|m|metres?|meters?|millimetres?|m³\/s|m3\/s|cumecs|ft|feet)\b/i;

const paragraph = (what: string, max: number) =>
  multiLineText(what)
    .min(1, `is required (${what})`)
    .max(max, `must be at most ${max} characters`)
    .refine((t) => !QUANTITY.test(t), { error: 'must not quote levels, depths, distances or flows: the letter puts in the engine’s numbers itself' })
    .superRefine(knownPlaceholdersOnly);

function knownPlaceholdersOnly(text: string, context: z.RefinementCtx): void {
  const unknown = unknownPlaceholders(text);
  if (unknown.length > 0) context.addIssue({ code: 'custom', message: unknownPlaceholderMessage(unknown) });
}

export const MIN_RESPONSE_DAYS = 7;
export const MAX_RESPONSE_DAYS = 90;
export const DEFAULT_RESPONSE_DAYS = 28;

export const letterParagraphsSchema = z.object({
  introduction: paragraph('who we are and why we write', 1500),
  scheme: paragraph('what the scheme is', 1500),
  response: paragraph('how to respond', 1500),
  // Contact details carry telephone numbers and postcodes, so only their length is checked.
  contact: multiLineText('how to reach the liaison officer').min(1, 'is required (how to reach the liaison officer)').max(600, 'must be at most 600 characters').superRefine(knownPlaceholdersOnly),
  signOff: multiLineText('name and position of the signatory').min(1, 'is required (name and position of the signatory)').max(200, 'must be at most 200 characters').superRefine(knownPlaceholdersOnly),
});
export type LetterParagraphs = z.infer<typeof letterParagraphsSchema>;

export const saveLetterTemplateSchema = letterParagraphsSchema.extend({
  schemeId: id,
  /** Days the landowner has to respond, counted from the letter's date. */
  responseDays: z
    .number('must be a number of days')
    .int('must be a whole number of days')
    .min(MIN_RESPONSE_DAYS, `must be at least ${MIN_RESPONSE_DAYS} days`)
    .max(MAX_RESPONSE_DAYS, `must be at most ${MAX_RESPONSE_DAYS} days`),
});
export type SaveLetterTemplateInput = z.infer<typeof saveLetterTemplateSchema>;

const parcelReference = z.string().trim().min(1, 'must not be empty').max(40, 'must be at most 40 characters');
export const generateLettersSchema = z.object({
  schemeId: id,
  revisionId: id,
  /** The parcels to write to; left out, every affected parcel gets a letter. */
  parcelReferences: z.array(parcelReference).min(1, 'must name at least one parcel').max(MAX_PARCELS, `must name at most ${MAX_PARCELS} parcels`).optional(),
});
export type GenerateLettersInput = z.infer<typeof generateLettersSchema>;

export const MAX_LETTERS_PER_SEND = 20;
export const sendBatchSchema = z.object({
  /** Letters sent by one request; the page repeats the request and shows the progress in between. */
  max: z.number().int('must be a whole number').min(1, 'must be at least 1').max(MAX_LETTERS_PER_SEND, `must be at most ${MAX_LETTERS_PER_SEND}`).default(5),
  retryFailed: z.boolean().default(false),
});
export type SendBatchInput = z.infer<typeof sendBatchSchema>;

export const RESPONSE_TYPES = { 'no-objection': 'No objection', objection: 'Objection', question: 'Question', other: 'Other' } as const;
export const RESPONSE_CHANNELS = { email: 'E-mail', post: 'Post', telephone: 'Telephone', meeting: 'Meeting' } as const;
const keysOf = <T extends object>(o: T) => Object.keys(o) as [keyof T & string, ...(keyof T & string)[]];

const responseFields = {
  receivedOn: isoDateText('the day the response arrived').refine(notAfterToday, { error: 'must not be in the future' }),
  responseType: z.enum(keysOf(RESPONSE_TYPES), 'must be no objection, objection, question or other'),
  channel: z.enum(keysOf(RESPONSE_CHANNELS), 'must be e-mail, post, telephone or meeting'),
  summary: multiLineText('what the landowner said').min(3, 'is required (what the landowner said, at least 3 characters)').max(2000, 'must be at most 2000 characters'),
};
export const logResponseSchema = z.object({ letterId: id, ...responseFields });
export type LogResponseInput = z.infer<typeof logResponseSchema>;

export const editResponseSchema = z.object({ responseId: id, ...responseFields });
export type EditResponseInput = z.infer<typeof editResponseSchema>;

const pastDay = (what: string) => isoDateText(what).refine(notAfterToday, { error: 'must not be in the future' });

export const markPostedSchema = z.object({ letterId: id, postedOn: pastDay('the day the letter was posted') });
export type MarkPostedInput = z.infer<typeof markPostedSchema>;

export const letterIdSchema = z.object({ letterId: id });
export const batchIdSchema = z.object({ batchId: id });

/** The template as typed (saved or not) and the parcel whose letter to show. */
export const previewLetterSchema = saveLetterTemplateSchema.extend({ parcelReference: z.string().trim().min(1, 'is required (the parcel to preview)').max(40, 'must be at most 40 characters') });
export type PreviewLetterInput = z.infer<typeof previewLetterSchema>;
