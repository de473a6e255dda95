import 'server-only';
import { createHash, randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { Letter, Parcel, type Revision, type Scheme, User } from '@/lib/db';
import { certificateVerificationUrl } from '@/lib/certificates/certificate-urls';
import { citableCertificate } from '@/lib/certificates/revision-revocation';
import { organisationName } from '@/lib/config/organisation';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import { calendarDateIn, responseDeadline } from '@/lib/dates/calendar-dates';
import { InvalidRequestError, UnprocessableError } from '@/lib/http/app-errors';
import { type ParcelImpactRow, impactForRevision } from '@/lib/parcels/compute-parcel-impact';
import { isPreliminary } from '@/lib/parcels/select-revision';
import { letterPdfOffThread } from '@/lib/pdf-pool/render-off-thread';
import { letterPlans } from '@/lib/plan/letter-plan';
import { writeLetterPdf } from './letter-files';
import type { LetterImpact } from './letter-impact';
import { namedMethods } from './letter-methods';
import { fillParagraphs, placeholderValues } from './letter-placeholder-values';
import { loadLetterTemplate } from './letter-template';
import type { LetterDocument } from './render-letter-pdf';

export interface PreparedLetter {
  id: string;
  parcelId: string;
  reference: string;
  version: number;
  category: string;
  impactJson: string;
  pdfPath: string;
  pdfSha256: string;
  recipientEmail: string | null;
  responseDueOn: string;
  documentJson: string;
  createdAt: string;
}

/** The latest letter version per parcel reference for a revision (a parcel keeps its reference across register versions; its row id changes). */
export async function latestVersions(revisionId: string, transaction?: Transaction): Promise<Map<string, number>> {
  const earlier = await Letter.findAll({ where: { revisionId }, attributes: ['parcelId', 'version'], transaction });
  const parcels = new Map((await Parcel.findAll({ where: { id: earlier.map((l) => l.parcelId) }, attributes: ['id', 'reference'], transaction })).map((p) => [p.id, p.reference.toLowerCase()]));
  const latest = new Map<string, number>();
  for (const l of earlier) {
    const ref = parcels.get(l.parcelId) ?? '';
    latest.set(ref, Math.max(latest.get(ref) ?? 0, l.version));
  }
  return latest;
}

/** What one parcel's letter says about its land, from the revision's results. */
export function letterImpact(row: ParcelImpactRow, revision: Revision, shared: Omit<LetterImpact, 'parcel' | 'category' | 'revision' | 'events' | 'governingEvent' | 'strip'>, discharges: Map<string, number>): LetterImpact {
  const { parcel } = row;
  return {
    ...shared,
    parcel: { reference: parcel.reference, distanceFromM: parcel.distanceFromM, distanceToM: parcel.distanceToM, bankSide: parcel.bankSide, groundLevelM: parcel.groundLevelM, landUse: parcel.landUse },
    category: row.category,
    revision: { id: revision.id, number: revision.number, status: revision.status },
    events: row.events.map((e) => ({ ...e, dischargeM3s: discharges.get(e.event) ?? 0 })),
    governingEvent: row.governingEvent,
    strip: row.strip,
  };
}

/** The affected parcels to write to: all of them, or those the officer chose (each chosen one must be affected). */
function chosenRows(affected: ParcelImpactRow[], references: string[] | undefined): ParcelImpactRow[] {
  if (!references) return affected;
  const wanted = new Set(references.map((r) => r.toLowerCase()));
  const known = new Set(affected.map((r) => r.parcel.reference.toLowerCase()));
  const strays = references.filter((r) => !known.has(r.toLowerCase()));
  if (strays.length > 0) throw new InvalidRequestError([{ path: 'parcelReferences', message: `must be parcels this revision affects; not affected or not in the register: ${strays.join(', ')}` }]);
  return affected.filter((r) => wanted.has(r.parcel.reference.toLowerCase()));
}

/**
 * Everything a batch needs before it is recorded: the chosen affected parcels' impact, and each letter's PDF rendered
 * on the PDF pool and written under the data directory. Outside any transaction, so rendering many letters never holds the write lock.
 * `written` collects the files, for the caller to remove if recording fails.
 */
export async function prepareLetters({ user, scheme, revision, written, baseUrl, parcelReferences }: { user: SessionUser; scheme: Scheme; revision: Revision; written: string[]; baseUrl: string; parcelReferences?: string[] }) {
  const { register, results, rows } = await impactForRevision({ schemeId: scheme.id, revision });
  if (!register) throw new UnprocessableError('This scheme has no parcels register yet; upload the parcels CSV first.');
  const affected = chosenRows(rows.filter((r) => r.category === 'affected'), parcelReferences);
  if (affected.length === 0) throw new UnprocessableError('No parcel is affected by this revision, so there are no letters to make.');
  const template = await loadLetterTemplate(scheme.id);
  const officer = await User.findByPk(user.id);
  const organisation = organisationName(officer?.organisation);
  const timeZone = portalTimeZone();
  const certificate = revision.status === 'countersigned' ? await citableCertificate(revision.id) : null;
  const cited = certificate ? { number: certificate.number, verificationUrl: certificateVerificationUrl(baseUrl, certificate.number) } : null;
  const shared = { impactThresholdM: results.impactThreshold, methods: namedMethods(results.caseInput), engineVersion: results.engineVersion, certificate: cited };
  const discharges = new Map(results.events.map((e) => [e.name, e.discharge]));
  const versions = await latestVersions(revision.id);
  const planOf = await letterPlans(scheme.id, results);
  const preliminary = isPreliminary(revision);
  const letters: PreparedLetter[] = [];
  for (const row of affected) {
    const { parcel } = row;
    const id = randomUUID();
    const createdAt = new Date().toISOString();
    const letterDate = calendarDateIn(timeZone, createdAt);
    const respondBy = responseDeadline({ letterMadeAt: createdAt, days: template.responseDays, timeZone });
    const version = (versions.get(parcel.reference.toLowerCase()) ?? 0) + 1;
    const impact = letterImpact(row, revision, shared, discharges);
    const values = placeholderValues({ parcel, scheme, officer: { name: user.name, role: user.role }, letterDate, respondBy, certificate: cited });
    const document: LetterDocument = {
      reference: `${scheme.reference}/${parcel.reference}/R${revision.number}-L${version}`,
      version,
      date: createdAt,
      letterDate,
      respondBy,
      preliminary,
      organisation,
      recipient: { name: parcel.ownerName, address: parcel.postalAddress },
      scheme: { name: scheme.name, reference: scheme.reference },
      paragraphs: fillParagraphs(template.paragraphs, values),
      impact,
      plan: planOf ? planOf(row) : null,
    };
    const pdf = await letterPdfOffThread(document);
    const pdfPath = await writeLetterPdf(id, pdf);
    written.push(pdfPath);
    letters.push({ id, parcelId: parcel.id, reference: parcel.reference, version, category: row.category, impactJson: JSON.stringify(impact), documentJson: JSON.stringify(document), pdfPath, pdfSha256: createHash('sha256').update(pdf).digest('hex'), recipientEmail: parcel.email, responseDueOn: respondBy, createdAt });
  }
  return { register, template, preliminary, letters, versions };
}
