import 'server-only';
import { readFile } from 'node:fs/promises';
import { simpleParser } from 'mailparser';
import { OutboxMessage, database } from '@/lib/db';

export interface OutboxEntry {
  id: string;
  from: string;
  to: string;
  subject: string;
  receivedAt: string;
  sizeBytes: number;
  text: string;
  attachments: { filename: string; contentType: string; sizeBytes: number }[];
  missing: boolean;
}

async function readEntry(m: OutboxMessage): Promise<OutboxEntry> {
  const base = { id: m.id, from: m.envelopeFrom, to: m.envelopeTo, subject: m.subject ?? '(no subject)', receivedAt: m.receivedAt, sizeBytes: m.sizeBytes };
  const raw = await readFile(m.rawPath).catch(() => null);
  if (!raw) return { ...base, text: '(the stored message file is missing)', attachments: [], missing: true };
  const parsed = await simpleParser(raw, { skipHtmlToText: false, skipTextToHtml: true, skipImageLinks: true });
  return {
    ...base,
    text: parsed.text ?? '',
    attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? '(unnamed)', contentType: a.contentType, sizeBytes: a.size })),
    missing: false,
  };
}

/** The messages the local SMTP server received, newest first, read back from their stored raw text. */
export async function listOutbox({ limit = 50 }: { limit?: number } = {}): Promise<{ total: number; messages: OutboxEntry[] }> {
  database();
  const [total, rows] = await Promise.all([OutboxMessage.count(), OutboxMessage.findAll({ order: [['receivedAt', 'DESC']], limit })]);
  return { total, messages: await Promise.all(rows.map(readEntry)) };
}
