import 'server-only';
import { readFile } from 'node:fs/promises';
import { simpleParser } from 'mailparser';
import { Op, col, fn, where as sqlWhere } from 'sequelize';
import { OutboxMessage, database } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';

export interface OutboxEntry {
  id: string;
  from: string;
  /** The From and Reply-To headers as the recipient sees them (the envelope sender can differ). */
  fromHeader: string;
  replyTo: string | null;
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
  if (!raw) return { ...base, fromHeader: '', replyTo: null, text: '(the stored message file is missing)', attachments: [], missing: true };
  const parsed = await simpleParser(raw, { skipHtmlToText: false, skipTextToHtml: true, skipImageLinks: true });
  return {
    ...base,
    fromHeader: parsed.from?.text ?? '',
    replyTo: parsed.replyTo?.text ?? null,
    text: parsed.text ?? '',
    attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? '(unnamed)', contentType: a.contentType, sizeBytes: a.size })),
    missing: false,
  };
}

// instr() rather than LIKE, so that % and _ in the search are plain characters (as the audit trail's search does).
const containing = (q: string) => ({ [Op.or]: ['subject', 'envelope_from', 'envelope_to'].map((column) => sqlWhere(fn('instr', fn('lower', col(column)), q.toLowerCase()), Op.gt, 0)) });

/** The messages the local SMTP server received, newest first, read back from their stored raw text; `q` searches subject, sender and recipient. */
export async function listOutbox({ limit = 50, q }: { limit?: number; q?: string } = {}): Promise<{ total: number; messages: OutboxEntry[] }> {
  database();
  const where = q ? containing(q) : {};
  const [total, rows] = await Promise.all([OutboxMessage.count({ where }), OutboxMessage.findAll({ where, order: [['receivedAt', 'DESC']], limit })]);
  return { total, messages: await Promise.all(rows.map(readEntry)) };
}

/** One attachment of a stored message, by its position, to open in the browser. */
export async function outboxAttachment({ messageId, index }: { messageId: string; index: number }) {
  database();
  const message = await OutboxMessage.findByPk(messageId);
  const raw = message ? await readFile(message.rawPath).catch(() => null) : null;
  if (!raw) throw new NotFoundError('No such message in the outbox.');
  const attachment = (await simpleParser(raw)).attachments[index];
  if (!attachment) throw new NotFoundError('The message has no such attachment.');
  return { content: attachment.content, contentType: attachment.contentType, filename: (attachment.filename ?? `attachment-${index + 1}`).replace(/[^A-Za-z0-9._-]/g, '-') };
}
