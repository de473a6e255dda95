import 'server-only';
import { randomUUID } from 'node:crypto';
import { rm } from 'node:fs/promises';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Letter, LetterBatch, ParcelRegister, database } from '@/lib/db';
import { type Revocation, revisionRevocation } from '@/lib/certificates/revision-revocation';
import { ConflictError, NotFoundError, UnprocessableError } from '@/lib/http/app-errors';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import { selectRevision } from '@/lib/parcels/select-revision';
import type { GenerateLettersInput } from '@/lib/validation/letter-schemas';
import { latestVersions, prepareLetters } from './prepare-letters';

async function pendingLetters(revisionId: string, transaction?: Transaction): Promise<number> {
  return Letter.count({ where: { revisionId, status: ['queued', 'sending', 'to-post'] }, transaction });
}

function revokedRefusal(revocation: Revocation): UnprocessableError {
  return new UnprocessableError(`Letters cannot be made from revision ${revocation.revisionNumber}: its certificate ${revocation.certificateNumber} was revoked. Reason given: ${revocation.reason}`);
}

const sameVersions = (a: Map<string, number>, b: Map<string, number>) => a.size === b.size && [...a].every(([k, v]) => b.get(k) === v);

/**
 * Makes one letter (a PDF and a queued row) per affected parcel of the current register, from the chosen revision,
 * in a new batch; letters from a revision that is not countersigned are PRELIMINARY, and a revision whose certificate
 * is revoked gives none. A letter from a certified revision cites its certificate number and verification link. The PDFs are rendered first;
 * the batch, its letters and the audit event are then recorded in one short transaction, which re-checks that
 * nothing changed meanwhile. Nothing is sent here.
 */
export async function generateLetters({ user, input, baseUrl }: { user: SessionUser; input: GenerateLettersInput; baseUrl: string }) {
  const sequelize = database();
  const { scheme } = await requireSchemeLiaisonAccess({ user, schemeId: input.schemeId, manage: true });
  const revision = await selectRevision({ schemeId: scheme.id, revisionId: input.revisionId });
  if (!revision) throw new NotFoundError('No such revision of this scheme.');
  if (revision.status === 'withdrawn') throw new UnprocessableError(`Revision ${revision.number} was withdrawn; letters cannot be made from it.`);
  const revocation = await revisionRevocation(revision);
  if (revocation) throw revokedRefusal(revocation);
  const pending = await pendingLetters(revision.id);
  if (pending > 0) throw new ConflictError(`${pending} letter(s) from this revision are still waiting to be sent or posted. Send or post them, or withdraw their batch, before making new ones.`);

  const written: string[] = [];
  try {
    const prepared = await prepareLetters({ user, scheme, revision, written, baseUrl, parcelReferences: input.parcelReferences });
    return await sequelize.transaction(async (transaction) => {
      await requireSchemeLiaisonAccess({ user, schemeId: scheme.id, manage: true, transaction });
      const revokedMeanwhile = await revisionRevocation(revision, transaction);
      if (revokedMeanwhile) throw revokedRefusal(revokedMeanwhile);
      const register = await ParcelRegister.findOne({ where: { schemeId: scheme.id }, order: [['version', 'DESC']], transaction });
      const unchanged = register?.id === prepared.register.id && (await pendingLetters(revision.id, transaction)) === 0 && sameVersions(prepared.versions, await latestVersions(revision.id, transaction));
      if (!unchanged) throw new ConflictError('The register or the letters changed while these letters were being made. Make them again.');
      const batch = await LetterBatch.create({ id: randomUUID(), schemeId: scheme.id, revisionId: revision.id, createdBy: user.id }, { transaction });
      await Letter.bulkCreate(
        prepared.letters.map((l) => ({ id: l.id, batchId: batch.id, parcelId: l.parcelId, revisionId: revision.id, templateId: prepared.template.id, version: l.version, preliminary: prepared.preliminary, category: l.category, impactJson: l.impactJson, pdfPath: l.pdfPath, pdfSha256: l.pdfSha256, recipientEmail: l.recipientEmail, status: l.recipientEmail ? 'queued' : 'to-post', responseDueOn: l.responseDueOn, documentJson: l.documentJson, failureReason: null, messageId: null, sentAt: null, acknowledgedAt: null, createdAt: l.createdAt })),
        { transaction },
      );
      await recordAuditEvent(
        { actorId: user.id, action: 'letters.generated', entityType: 'letter_batch', entityId: batch.id, schemeId: scheme.id, details: { revision: revision.number, registerVersion: prepared.register.version, letters: prepared.letters.length, toPost: prepared.letters.filter((l) => !l.recipientEmail).length, preliminary: prepared.preliminary, templateVersion: prepared.template.version, parcels: prepared.letters.map((l) => l.reference) } },
        transaction,
      );
      return { batchId: batch.id, letters: prepared.letters.length, toPost: prepared.letters.filter((l) => !l.recipientEmail).length, preliminary: prepared.preliminary };
    });
  } catch (error) {
    await Promise.all(written.map((f) => rm(f, { force: true })));
    throw error;
  }
}
