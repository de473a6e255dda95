import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { certificateVerificationUrl } from '@/lib/certificates/certificate-urls';
import { citableCertificate } from '@/lib/certificates/revision-revocation';
import { organisationName } from '@/lib/config/organisation';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { User } from '@/lib/db';
import { calendarDateIn, responseDeadline } from '@/lib/dates/calendar-dates';
import { UnprocessableError } from '@/lib/http/app-errors';
import { impactForRevision } from '@/lib/parcels/compute-parcel-impact';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import { isPreliminary, selectRevision } from '@/lib/parcels/select-revision';
import type { PreviewLetterInput } from '@/lib/validation/letter-schemas';
import { addressLines } from './letter-address';
import { eventParagraph } from './letter-content';
import { namedMethods } from './letter-methods';
import { fillParagraphs, placeholderValues } from './letter-placeholder-values';
import { letterImpact } from './prepare-letters';

/**
 * The letter one parcel's owner would get from the template as typed (saved or not) and the scheme's current
 * revision, as text: nothing is stored and no PDF is made. The engine's paragraphs are those the letter would print.
 */
export async function previewLetter({ user, input, baseUrl }: { user: SessionUser; input: PreviewLetterInput; baseUrl: string }) {
  const { scheme } = await requireSchemeLiaisonAccess({ user, schemeId: input.schemeId });
  const revision = await selectRevision({ schemeId: scheme.id });
  if (!revision) throw new UnprocessableError('The scheme has no revision yet, so there are no figures to preview.');
  const { register, results, rows } = await impactForRevision({ schemeId: scheme.id, revision });
  const row = rows.find((r) => r.parcel.reference.toLowerCase() === input.parcelReference.toLowerCase());
  if (!register || !row) throw new UnprocessableError(`Parcel ${input.parcelReference} is not in the current parcels register.`);
  const now = new Date().toISOString();
  const timeZone = portalTimeZone();
  const letterDate = calendarDateIn(timeZone, now);
  const respondBy = responseDeadline({ letterMadeAt: now, days: input.responseDays, timeZone });
  const certificate = revision.status === 'countersigned' ? await citableCertificate(revision.id) : null;
  const cited = certificate ? { number: certificate.number, verificationUrl: certificateVerificationUrl(baseUrl, certificate.number) } : null;
  const values = placeholderValues({ parcel: row.parcel, scheme, officer: { name: user.name, role: user.role }, letterDate, respondBy, certificate: cited });
  const shared = { impactThresholdM: results.impactThreshold, methods: namedMethods(results.caseInput), engineVersion: results.engineVersion, certificate: cited };
  const impact = letterImpact(row, revision, shared, new Map(results.events.map((e) => [e.name, e.discharge])));
  return {
    organisation: organisationName((await User.findByPk(user.id))?.organisation),
    revisionNumber: revision.number,
    preliminary: isPreliminary(revision),
    affected: row.category === 'affected',
    letterDate,
    respondBy,
    address: addressLines(row.parcel.ownerName, row.parcel.postalAddress),
    paragraphs: fillParagraphs(input, values),
    events: impact.events.map((e) => eventParagraph(e, impact)),
  };
}
export type LetterPreview = Awaited<ReturnType<typeof previewLetter>>;
