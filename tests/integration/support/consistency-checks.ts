import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import canonicalize from 'canonicalize';
import { AuditEvent, Certificate, Letter, OutboxMessage, database } from '@/lib/db';
import { dataDirectory } from '@/lib/db/database-path';
import { letterMessageId } from '@/lib/letters/letter-delivery';

const sha256 = (data: string | Buffer) => createHash('sha256').update(data).digest('hex');

/** Every break in the audit chain: a previousHash that is not the hash before it, or a hash that does not cover its row. */
export async function auditChainBreaks(): Promise<string[]> {
  database();
  const events = await AuditEvent.findAll({ order: [['id', 'ASC']] });
  const breaks: string[] = [];
  events.forEach((e, i) => {
    const expectedPrevious = i === 0 ? '0'.repeat(64) : events[i - 1].hash;
    if (e.previousHash !== expectedPrevious) breaks.push(`event ${e.id} (${e.action}) does not link to the event before it`);
    const payload = canonicalize({ previousHash: e.previousHash, at: e.at, actorId: e.actorId, action: e.action, entityType: e.entityType, entityId: e.entityId, schemeId: e.schemeId, detailsJson: e.detailsJson });
    if (sha256(payload ?? '') !== e.hash) breaks.push(`event ${e.id} (${e.action}) has a hash that does not cover it`);
  });
  return breaks;
}

/** Certificate rows against the PDF files under the data directory. */
export async function certificateStorage() {
  database();
  const rows = await Certificate.findAll();
  const folder = dataDirectory('certificates');
  const files = existsSync(folder) ? readdirSync(folder).map((name) => path.join('certificates', name)) : [];
  const recorded = new Set(rows.map((r) => r.pdfPath));
  return {
    rows,
    orphanFiles: files.filter((f) => !recorded.has(f)),
    rowsWithoutFile: rows.filter((r) => !existsSync(dataDirectory(r.pdfPath))).map((r) => r.number),
    rowsWithWrongFile: rows.filter((r) => existsSync(dataDirectory(r.pdfPath)) && sha256(readFileSync(dataDirectory(r.pdfPath))) !== r.pdfSha256).map((r) => r.number),
  };
}

/** Letter PDFs on disk that no letter row points to. */
export async function orphanLetterFiles(): Promise<string[]> {
  database();
  const folder = dataDirectory('letters');
  if (!existsSync(folder)) return [];
  const recorded = new Set((await Letter.findAll({ attributes: ['pdfPath'] })).map((l) => l.pdfPath));
  return readdirSync(folder).map((name) => path.join(folder, name)).filter((f) => !recorded.has(f));
}

/** How many messages the local mail server holds for each letter of a batch, by the letter's own Message-ID. */
export async function messagesPerLetter(batchId: string): Promise<Map<string, number>> {
  database();
  const letters = await Letter.findAll({ where: { batchId }, attributes: ['id'] });
  const counts = new Map<string, number>();
  for (const l of letters) counts.set(l.id, await OutboxMessage.count({ where: { messageId: letterMessageId(l.id) } }));
  return counts;
}
