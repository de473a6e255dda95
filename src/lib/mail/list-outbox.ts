import 'server-only';
import { readFile } from 'node:fs/promises';
import { OutboxMessage, database } from '@/lib/db';

export async function listOutbox(limit = 50) {
  database();
  const messages = await OutboxMessage.findAll({ order: [['receivedAt', 'DESC']], limit });
  return Promise.all(
    messages.map(async (m) => ({
      id: m.id,
      to: m.envelopeTo,
      subject: m.subject ?? '(no subject)',
      receivedAt: m.receivedAt,
      sizeBytes: m.sizeBytes,
      raw: await readFile(m.rawPath, 'utf8').catch(() => '(the stored message file is missing)'),
    })),
  );
}
