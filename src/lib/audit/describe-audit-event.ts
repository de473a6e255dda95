import { ACCOUNT_WORDS } from './account-event-words';
import { type AuditNames, type DescribableEvent, type Words, parseDetails } from './event-details';
import { LETTER_WORDS } from './letter-event-words';
import { PARCEL_PLAN_WORDS } from './parcel-plan-event-words';
import { WORK_WORDS } from './work-event-words';

export type { AuditNames, DescribableEvent } from './event-details';

const WORDS: Record<string, Words> = { ...ACCOUNT_WORDS, ...WORK_WORDS, ...LETTER_WORDS, ...PARCEL_PLAN_WORDS };

// A kind recorded by a newer part of the portal that has no words yet still reads as words, never as its code.
const fallback: Words = (event) => `recorded: ${event.action.replace(/[._-]+/g, ' ').trim()}`;

export interface DescribedEvent {
  /** Who did it: a person's name, or who it was when no one was signed in. */
  who: string;
  /** What they did, in a practitioner's words, with the names and numbers of what it touched. */
  what: string;
  /** The scheme it concerns ("reference name"), if any. */
  scheme: string | null;
}

export function describeAuditEvent(event: DescribableEvent, names: AuditNames): DescribedEvent {
  const details = parseDetails(event.detailsJson);
  const who = event.actorId ? names.person(event.actorId) : event.action.startsWith('user.') ? 'Someone not signed in' : 'The portal';
  const what = (Object.hasOwn(WORDS, event.action) ? WORDS[event.action] : fallback)(event, details, names);
  return { who, what, scheme: names.scheme(event.schemeId) };
}
