import { z } from 'zod';
import { isoDateText } from './iso-date';
import { multiLineText } from './plain-text';

// Letters to landowners: the template's free-text paragraphs, generating, sending and logging responses.

const id = z.string().trim().min(1, 'is required').max(64, 'is not a valid id');
/** A level, depth, distance or flow typed into the free text would go out unchecked: the letter's numbers come from the engine. */
const QUANTITY = /\d\s*(mm|cm|km|m|metres?|meters?|millimetres?|m³\/s|m3\/s|cumecs|ft|feet)\b/i;

const paragraph = (what: string, max: number) =>
  multiLineText(what)
    .min(1, `is required (${what})`)
    .max(max, `must be at most ${max} characters`)
    .refine((t) => !QUANTITY.test(t), { error: 'must not quote levels, depths, distances or flows: the letter puts in the engine’s numbers itself' });

export const TEMPLATE_PLACEHOLDERS = ['{owner_name}', '{parcel_reference}', '{scheme_name}', '{watercourse}', '{site}'] as const;

export const letterParagraphsSchema = z.object({
  introduction: paragraph('who we are and why we write', 1500),
  scheme: paragraph('what the scheme is', 1500),
  response: paragraph('how to respond', 1500),
  // Contact details carry telephone numbers and postcodes, so only their length is checked.
  contact: multiLineText('how to reach the liaison officer').min(1, 'is required (how to reach the liaison officer)').max(600, 'must be at most 600 characters'),
  signOff: multiLineText('name and position of the signatory').min(1, 'is required (name and position of the signatory)').max(200, 'must be at most 200 characters'),
});
export type LetterParagraphs = z.infer<typeof letterParagraphsSchema>;

export const saveLetterTemplateSchema = letterParagraphsSchema.extend({ schemeId: id });
export type SaveLetterTemplateInput = z.infer<typeof saveLetterTemplateSchema>;

export const generateLettersSchema = z.object({ schemeId: id, revisionId: id });
export type GenerateLettersInput = z.infer<typeof generateLettersSchema>;

export const MAX_LETTERS_PER_SEND = 20;
export const sendBatchSchema = z.object({
  /** Letters sent by one request; the page repeats the request and shows the progress in between. */
  max: z.number().int('must be a whole number').min(1, 'must be at least 1').max(MAX_LETTERS_PER_SEND, `must be at most ${MAX_LETTERS_PER_SEND}`).default(5),
  retryFailed: z.boolean().default(false),
});
export type SendBatchInput = z.infer<typeof sendBatchSchema>;

export const logResponseSchema = z.object({
  letterId: id,
  receivedOn: isoDateText('the day the response arrived').refine((d) => Date.parse(`${d}T00:00:00Z`) <= Date.now(), { error: 'must not be in the future' }),
  summary: multiLineText('what the landowner said').min(3, 'is required (what the landowner said, at least 3 characters)').max(2000, 'must be at most 2000 characters'),
});
export type LogResponseInput = z.infer<typeof logResponseSchema>;
