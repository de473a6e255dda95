import { addDays, longDate } from '@/lib/dates/calendar-dates';
import type { LetterDocument } from './render-letter-pdf';

/** Days a reminder gives the landowner to respond, from the reminder's date: a fortnight, a common practice. */
export const REMINDER_DAYS = 14;

/** The letter re-dated as a reminder: same figures and wording, the reminder's date and a new day to respond by. */
export function reminderDocument(letter: LetterDocument, reminderDate: string): LetterDocument {
  return { ...letter, letterDate: reminderDate, respondBy: addDays(reminderDate, REMINDER_DAYS), reminderOf: { firstLetterDate: letter.letterDate } };
}

/** The short reminder e-mail; the letter itself was attached to the first e-mail. */
export function reminderEmailText({ ownerName, letter, organisation }: { ownerName: string; letter: LetterDocument; organisation: string }): string {
  return [
    `Dear ${ownerName},`,
    '',
    `On ${longDate(letter.reminderOf?.firstLetterDate ?? letter.letterDate)} we wrote to you about "${letter.scheme.name}" and what it would mean for your land (our reference ${letter.reference}). We have not yet heard from you.`,
    '',
    `Please tell us by ${longDate(letter.respondBy)} if you have questions or concerns, or know of anything that would change our figures. You can reply to this e-mail, write to us or telephone us; please quote our reference.`,
    '',
    organisation,
  ].join('\n');
}
