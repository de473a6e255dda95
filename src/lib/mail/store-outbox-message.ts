import 'server-only';
import { randomUUID } from 'node:crypto';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { OutboxMessage, database } from '@/lib/db';
import { dataDirectory } from '@/lib/db/database-path';

export interface ReceivedMessage {
  raw: Buffer;
  envelopeFrom: string;
  envelopeTo: string[];
}

/** Keeps one message the local SMTP server received: the raw RFC 5322 text on disk, its envelope and headers in a row. */
export async function storeOutboxMessage({ raw, envelopeFrom, envelopeTo }: ReceivedMessage): Promise<OutboxMessage> {
  const id = randomUUID();
  const folder = dataDirectory('outbox');
  await mkdir(folder, { recursive: true });
  // The stored name is ours; nothing the sender wrote becomes part of a path.
  const rawPath = path.join(folder, `${id}.eml`);
  await writeFile(rawPath, raw);
  const parsed = await simpleParser(raw, { skipHtmlToText: true, skipTextToHtml: true, skipImageLinks: true });
  database();
  return OutboxMessage.create({
    id,
    messageId: parsed.messageId ?? null,
    envelopeFrom,
    envelopeTo: envelopeTo.join(', '),
    subject: parsed.subject ?? null,
    rawPath,
    sizeBytes: raw.length,
    receivedAt: new Date().toISOString(),
  });
}
