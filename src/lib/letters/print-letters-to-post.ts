import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Letter, database } from '@/lib/db';
import { UnprocessableError } from '@/lib/http/app-errors';
import { lettersToPostOffThread } from '@/lib/pdf-pool/render-off-thread';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import { loadBatch } from './batch-progress';
import type { LetterDocument } from './render-letter-pdf';

/** Parcel references compared as people read them: HM-2 before HM-10. */
const byReference = (a: LetterDocument, b: LetterDocument) => a.impact.parcel.reference.localeCompare(b.impact.parcel.reference, 'en', { numeric: true });

/**
 * Every letter of a batch still to post, in one PDF to print, each from a new page with the address placed for a
 * window envelope. Rendered from what each letter's own PDF was made from, so the printed letter says what was stored.
 */
export async function printLettersToPost({ user, batchId }: { user: SessionUser; batchId: string }) {
  const batch = await loadBatch(batchId);
  const { scheme } = await requireSchemeLiaisonAccess({ user, schemeId: batch.schemeId, manage: true });
  const letters = await Letter.findAll({ where: { batchId, status: 'to-post' }, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
  const documents = letters.flatMap((l) => (l.documentJson ? [JSON.parse(l.documentJson) as LetterDocument] : [])).sort(byReference);
  if (documents.length === 0) throw new UnprocessableError('This batch has no letters to post: every one went by e-mail or is marked posted.');
  const printedAt = new Date().toISOString();
  const pdf = await lettersToPostOffThread(documents, printedAt);
  await database().transaction((transaction) => recordAuditEvent({ actorId: user.id, action: 'letters.printed', entityType: 'letter_batch', entityId: batchId, schemeId: scheme.id, details: { letters: documents.length } }, transaction));
  return { pdf, fileName: `${scheme.reference}-letters-to-post-${printedAt.slice(0, 10)}.pdf`.replace(/[^A-Za-z0-9._-]/g, '-') };
}
