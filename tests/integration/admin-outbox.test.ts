import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as attachment } from '@/app/api/admin/outbox/[id]/attachment/route';
import { listOutbox } from '@/lib/mail/list-outbox';
import { startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { sendMail } from '@/lib/mail/send-mail';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
const pdf = Buffer.from('%PDF-1.4\n% a stand-in for a letter\n');

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  await startLocalSmtpServer(0);
  signedInAs((await createTestUser('admin')).sessionUser);
  await sendMail({ to: 'edith.lowther@weirmeadow.test', subject: 'Harrowfield Mill weir: your land at HM-02', text: 'See https://portal.wendle.test/verify/C-1 for the certificate.', replyTo: 'liaison@wendle-valley.test', from: { name: 'Wendle Valley Drainage Board', address: 'no-reply@wendle-valley.test' }, attachments: [{ filename: 'letter-HM-02-v1.pdf', content: pdf, contentType: 'application/pdf' }] });
  await sendMail({ to: 'someone@example.test', subject: 'Your Sillmark account 100%_done', text: 'Hello' });
});
afterAll(async () => {
  signedInAs(null);
  await stopLocalSmtpServer();
  await db.cleanup();
});

describe('the mail outbox', () => {
  it('shows the sender’s name and the Reply-To, and finds a message by subject or recipient, % and _ as plain characters', async () => {
    const { messages } = await listOutbox({ q: 'weirmeadow' });
    expect(messages).toHaveLength(1);
    expect(messages[0]).toMatchObject({ fromHeader: expect.stringContaining('Wendle Valley Drainage Board'), replyTo: 'liaison@wendle-valley.test' });
    expect((await listOutbox({ q: 'HM-02' })).total).toBe(1);
    expect((await listOutbox({ q: '0%_d' })).total).toBe(1);
    expect((await listOutbox({ q: '%' })).total).toBe(1);
    expect((await listOutbox()).total).toBe(2);
  });

  it('opens an attachment as it was sent, and refuses one that is not there', async () => {
    const [message] = (await listOutbox({ q: 'weirmeadow' })).messages;
    const call = (n: string) => attachment(new Request(`http://localhost/api/admin/outbox/${message.id}/attachment?n=${n}`), { params: Promise.resolve({ id: message.id }) });
    const opened = await call('0');
    expect(opened.status).toBe(200);
    expect(opened.headers.get('content-type')).toBe('application/pdf');
    expect(Buffer.from(await opened.arrayBuffer()).equals(pdf)).toBe(true);
    expect((await call('1')).status).toBe(404);
    expect((await call('x')).status).toBe(400);
  });
});
