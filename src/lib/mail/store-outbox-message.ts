import 'server-only';
import { randomUUID } from 'node:crypto';
import { mkdir, rm } from 'node:fs/promises';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { UniqueConstraintError } from 'sequelize';
import { OutboxMessage, database } from '@/lib/db';
import { dataDirectory } from '@/lib/db/database-path';
import { writeDurably } from '@/lib/storage/write-durably';

export interface ReceivedMessage {
  raw: Buffer;
  envelopeFrom: string;
  envelopeTo: string[];
}

/**
 * Keeps one message the local SMTP server received: the raw RFC 5322 text on disk, its envelope and headers in a row.
 * A message whose Message-ID is kept already is not kept twice: a sender that died after our "accepted" and before
 * recording it sends it again under the same Message-ID, and the outbox shows it once, as a mailbox would.
 */
export async function storeOutboxMessage({ raw, envelopeFrom, envelopeTo }: ReceivedMessage): Promise<OutboxMessage> {
  const parsed = await simpleParser(raw, { skipHtmlToText: true, skipTextToHtml: true, skipImageLinks: true });
  const messageId = parsed.messageId ?? null;
  database();
  const kept = messageId ? await OutboxMessage.findOne({ where: { messageId } }) : null;
  if (kept) return kept;
  const id = randomUUID();
  const folder = dataDirectory('outbox');
  await mkdir(folder, { recursive: true });
  // The stored name is ours; nothing the sender wrote becomes part of a path.
  const rawPath = path.join(folder, `${id}.eml`);
  await writeDurably(rawPath, raw);
  try {
    return await OutboxMessage.create({ id, messageId, envelopeFrom, envelopeTo: envelopeTo.join(', '), subject: parsed.subject ?? null, rawPath, sizeBytes: raw.length, receivedAt: new Date().toISOString() });
  } catch (error) {
    await rm(rawPath, { force: true });
    const twin = error instanceof UniqueConstraintError && messageId ? await OutboxMessage.findOne({ where: { messageId } }) : null;
    if (twin) return twin;
    throw error;
  }
}
