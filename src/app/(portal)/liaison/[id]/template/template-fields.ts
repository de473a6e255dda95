import type { LetterParagraphs } from '@/lib/validation/letter-schemas';

// The template's paragraphs as the form names them; the preview names a refused one the same way.
export const FIELDS: { name: keyof LetterParagraphs; label: string; hint: string; rows: number }[] = [
  { name: 'introduction', label: 'Who we are and why we write', hint: 'Opens the letter, after “Dear …”.', rows: 4 },
  { name: 'scheme', label: 'The scheme', hint: 'What the scheme is, in plain words.', rows: 4 },
  { name: 'response', label: 'How to respond', hint: 'After the figures and the caution.', rows: 4 },
  { name: 'contact', label: 'Contact details', hint: 'One item per line: office, address, telephone, e-mail.', rows: 4 },
  { name: 'signOff', label: 'Signed', hint: 'Name and position under “Yours sincerely”.', rows: 2 },
];

/** A field of the template in words, for messages. */
export const fieldWords = (path: string) => FIELDS.find((f) => f.name === path)?.label ?? (path === 'responseDays' ? 'Days to respond' : path === 'parcelReference' ? 'For parcel' : 'The template');
