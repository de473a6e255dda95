import { existsSync, readFileSync } from 'node:fs';
import { simpleParser } from 'mailparser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutboxMessage, database } from '@/lib/db';
import { listOutbox } from '@/lib/mail/list-outbox';
import { type LocalSmtpServer, startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { sendMail } from '@/lib/mail/send-mail';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let smtp: LocalSmtpServer;

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  smtp = await startLocalSmtpServer(0);
});
afterAll(async () => {
  await stopLocalSmtpServer();
  await db.cleanup();
});

describe('mail without SMTP_URL goes over SMTP to the local fake server, which keeps it in the outbox', () => {
  it('runs one server per process: a second start returns the running one', async () => {
    const again = await startLocalSmtpServer(0);
    expect(again.port).toBe(smtp.port);
    expect(smtp.port).toBeGreaterThan(0);
  });

  it('stores the raw message on disk and a row, and the attachment survives the round trip byte for byte', async () => {
    const pdf = Buffer.from('%PDF-1.4 test attachment bytes \u0000\u0001\u0002');
    const { messageId } = await sendMail({ to: 'owner@weirmeadow.test', subject: 'Your land at HM-02', text: 'Dear owner,\nplease see the letter.', attachments: [{ filename: 'letter.pdf', content: pdf, contentType: 'application/pdf' }], messageId: '<mail-test-1@sillmark.local>' });
    expect(messageId).toBe('<mail-test-1@sillmark.local>');
    database();
    const row = await OutboxMessage.findOne({ where: { messageId } });
    expect(row).toMatchObject({ envelopeTo: 'owner@weirmeadow.test', subject: 'Your land at HM-02' });
    expect(row!.rawPath.startsWith(db.file.replace(/test\.sqlite$/, 'outbox'))).toBe(true);
    expect(existsSync(row!.rawPath)).toBe(true);
    const parsed = await simpleParser(readFileSync(row!.rawPath));
    expect(parsed.text).toContain('please see the letter');
    expect(parsed.attachments).toHaveLength(1);
    expect(parsed.attachments[0].filename).toBe('letter.pdf');
    expect(Buffer.compare(parsed.attachments[0].content, pdf)).toBe(0);
  });

  it('refuses a recipient under the reserved .invalid domain with the server’s reason, storing nothing', async () => {
    const before = await tableSnapshot();
    await expect(sendMail({ to: 'nobody@example.invalid', subject: 'x', text: 'x' })).rejects.toThrow(/does not exist/);
    expect(await tableSnapshot()).toEqual(before);
  });

  it('lists the outbox for the admin page with the attachments read back from the stored message', async () => {
    const { total, messages } = await listOutbox();
    expect(total).toBe(1);
    expect(messages[0]).toMatchObject({ to: 'owner@weirmeadow.test', subject: 'Your land at HM-02', missing: false });
    expect(messages[0].attachments).toEqual([{ filename: 'letter.pdf', contentType: 'application/pdf', sizeBytes: expect.any(Number) }]);
  });
});
