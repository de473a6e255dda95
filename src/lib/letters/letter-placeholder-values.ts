import { ROLE_LABELS, type Role } from '@/lib/auth/roles';
import { longDate } from '@/lib/dates/calendar-dates';
import type { LetterParagraphs } from '@/lib/validation/letter-schemas';
import { type PlaceholderValues, fillPlaceholders } from '@/lib/validation/letter-placeholders';

export interface PlaceholderSources {
  parcel: { ownerName: string; postalAddress: string; reference: string };
  scheme: { name: string; watercourse: string; site: string };
  officer: { name: string; role: Role };
  letterDate: string;
  respondBy: string;
  certificate: { number: string; verificationUrl: string } | null;
}

/** What each placeholder stands for in one letter; a letter without a certificate says so in words. */
export function placeholderValues(s: PlaceholderSources): PlaceholderValues {
  return {
    owner_name: s.parcel.ownerName,
    postal_address: s.parcel.postalAddress.split(/\r?\n|;/).map((p) => p.trim()).filter(Boolean).join(', '),
    parcel_reference: s.parcel.reference,
    scheme_name: s.scheme.name,
    watercourse: s.scheme.watercourse,
    site: s.scheme.site,
    letter_date: longDate(s.letterDate),
    response_deadline: longDate(s.respondBy),
    officer_name: s.officer.name,
    officer_role: ROLE_LABELS[s.officer.role] === 'Landowner liaison' ? 'Landowner liaison officer' : ROLE_LABELS[s.officer.role],
    certificate_number: s.certificate?.number ?? '(no certificate yet: the design has not been independently checked)',
    verification_link: s.certificate?.verificationUrl ?? '(no certificate yet)',
  };
}

export function fillParagraphs(paragraphs: LetterParagraphs, values: PlaceholderValues): LetterParagraphs {
  const fill = (t: string) => fillPlaceholders(t, values);
  return { introduction: fill(paragraphs.introduction), scheme: fill(paragraphs.scheme), response: fill(paragraphs.response), contact: fill(paragraphs.contact), signOff: fill(paragraphs.signOff) };
}
