import 'server-only';
import type { Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { revisionRevocation } from '@/lib/certificates/revision-revocation';
import { Letter, LetterResponse, Parcel, Revision, User, database } from '@/lib/db';
import type { LetterStatus } from '@/lib/db/models/letter';
import { NotFoundError } from '@/lib/http/app-errors';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import type { LetterImpact } from './letter-impact';

/** A letter and its scheme, once the user's access to that scheme's owner details is checked; unknown or hidden is 404. */
export async function requireLetterAccess({ user, letterId, manage = false, transaction }: { user: SessionUser; letterId: string; manage?: boolean; transaction?: Transaction }) {
  database();
  const letter = await Letter.findByPk(letterId, { transaction });
  const revision = letter ? await Revision.findByPk(letter.revisionId, { transaction }) : null;
  if (!letter || !revision) throw new NotFoundError('No such letter.');
  const { scheme, access } = await requireSchemeLiaisonAccess({ user, schemeId: revision.schemeId, manage, transaction });
  return { letter, revision, scheme, access };
}

/** Everything the letter's page shows: to whom and when it went, its numbers, and the responses logged. */
export async function loadLetterDetail({ user, letterId }: { user: SessionUser; letterId: string }) {
  const { letter, revision, scheme, access } = await requireLetterAccess({ user, letterId });
  const parcel = await Parcel.findByPk(letter.parcelId);
  const responses = await LetterResponse.findAll({ where: { letterId }, order: [['receivedAt', 'DESC'], ['createdAt', 'DESC']] });
  const people = new Map((await User.findAll({ where: { id: responses.map((r) => r.loggedBy) } })).map((u) => [u.id, u.name]));
  return {
    access,
    scheme: { id: scheme.id, reference: scheme.reference, name: scheme.name },
    revision: { id: revision.id, number: revision.number, status: revision.status, revoked: (await revisionRevocation(revision)) !== null },
    letter: { id: letter.id, version: letter.version, preliminary: letter.preliminary, category: letter.category, status: letter.status as LetterStatus, recipientEmail: letter.recipientEmail, failureReason: letter.failureReason, messageId: letter.messageId, sentAt: letter.sentAt, acknowledgedAt: letter.acknowledgedAt, createdAt: letter.createdAt, pdfSha256: letter.pdfSha256 },
    parcel: parcel ? { reference: parcel.reference, ownerName: parcel.ownerName, postalAddress: parcel.postalAddress } : null,
    impact: JSON.parse(letter.impactJson) as LetterImpact,
    responses: responses.map((r) => ({ id: r.id, receivedAt: r.receivedAt, summary: r.summary, loggedBy: people.get(r.loggedBy) ?? 'unknown user', createdAt: r.createdAt })),
  };
}
export type LetterDetail = Awaited<ReturnType<typeof loadLetterDetail>>;
