import { type Words, count, plural, text } from './event-details';

/** The parcels register and the letters to landowners. */
export const LETTER_WORDS: Record<string, Words> = {
  'parcels.register-imported': (_e, d) => `imported the parcels register from ${text(d, 'file') ?? 'a file'}${count(d, 'parcels') !== null ? ` (${plural(count(d, 'parcels') ?? 0, 'parcel')})` : ''}, making version ${String(d.version ?? '?')}`,
  'parcels.register-edited': (_e, d) => `edited the parcels register, making version ${String(d.version ?? '?')}`,
  'letters.template-saved': (_e, d) => `saved version ${String(d.version ?? '?')} of the letter template`,
  'letters.generated': (_e, d) => `generated ${plural(count(d, 'letters') ?? 0, 'letter')} for revision ${String(d.revision ?? '?')}${d.preliminary === true ? ' (preliminary)' : ''}`,
  'letters.retry': (_e, d) => `put ${plural(count(d, 'letters') ?? 0, 'failed letter')} back in the queue`,
  'letter.sent': (_e, d) => `sent a letter by e-mail${d.recovered === true ? ' (confirmed after an interrupted send)' : ''}`,
  'letter.send-failed': (_e, d) => `could not send a letter${text(d, 'reason') ? `: ${text(d, 'reason')}` : ''}`,
  'letter.requeued': () => 'put a letter back in the queue',
  'letters.batch-withdrawn': (_e, d) => `withdrew a batch of ${plural(count(d, 'letters') ?? 0, 'letter')} before any was sent`,
  'letter.resend': () => 'put a letter that failed back to be sent again',
  'letter.posted': (_e, d) => `marked a letter posted${text(d, 'postedOn') ? ` on ${text(d, 'postedOn')}` : ''}`,
  'letters.printed': (_e, d) => `printed ${plural(count(d, 'letters') ?? 0, 'letter')} to post`,
  'letter.response-edited': () => 'edited a reply to a letter, keeping the earlier wording',
  'letter.reminder-made': (_e, d) => `made a reminder ${d.channel === 'post' ? 'to post' : 'by e-mail'}`,
  'letter.response-logged': (_e, d) => `logged a reply to a letter${text(d, 'receivedOn') ? `, received on ${text(d, 'receivedOn')}` : ''}`,
};
