import { readdir } from 'node:fs/promises';
import { Op } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutboundMessage, OutboxMessage, database } from '@/lib/db';
import { dataDirectory } from '@/lib/db/database-path';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { queueMail } from '@/lib/mail/queue-mail';
import { SENDING_LEASE_MS, retryDelayMs } from '@/lib/mail/retry-schedule';
import { sendMail } from '@/lib/mail/send-mail';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import type { FaultJob } from './support/fault-job';
import { runInChildProcess } from './support/fault-runner';
import { createTestScheme } from './support/scheme-factory';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// Issue 14 §5: the e-mail a decision owes is written in the decision's transaction and delivered after it commits.
// The server is a separate process killed with SIGKILL; a fresh process then plays the restarted server's deliverer.

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Person;
let checker: Person;

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  designer = await createTestUser('designer');
  checker = await createTestUser('checker');
});
afterAll(async () => {
  await stopLocalSmtpServer();
  await db.cleanup();
});

const child = (job: FaultJob) => runInChildProcess(job, db.file);
const restartedDeliverer = (clockAheadMs = 0) => child({ use: 'deliver-mail', clockAheadMs });
const kept = (where: { subject?: string; messageId?: string }) => OutboxMessage.count({ where: where.subject ? { subject: { [Op.like]: where.subject } } : { messageId: where.messageId } });

async function queueOne(subject: string, to = designer.user.email): Promise<OutboundMessage> {
  const [id] = await database().transaction((transaction) => queueMail({ purpose: 'test', messages: [{ to, subject, text: 'Invented test message about the River Wendle.' }] }, transaction));
  return (await OutboundMessage.findByPk(id))!;
}

describe('the server killed just after the countersignature committed', () => {
  it('keeps the designer’s e-mail queued, and the restarted server delivers it exactly once', async () => {
    const { revision } = await createTestScheme(designer.user.id);
    await submitForCheck({ revisionId: revision.id, checkerId: checker.user.id, designer: designer.sessionUser, baseUrl: 'http://localhost:3000' });

    const killed = await child({ use: 'countersign', revisionId: revision.id, checker: checker.sessionUser, password: checker.password, stopAt: 'committed' });
    expect(killed.stoppedAt, killed.output).toBe('committed');
    const owed = await OutboundMessage.findAll({ where: { purpose: 'revision.countersigned', recipient: designer.user.email } });
    expect(owed.map((m) => [m.status, m.attempts])).toEqual([['pending', 0]]);
    expect(owed[0].subject).toMatch(/certificate .* issued/);
    expect(await kept({ messageId: owed[0].messageId })).toBe(0);

    const restart = await restartedDeliverer();
    expect(restart.error, restart.output).toBeNull();
    expect(restart.result).toMatchObject({ delivered: 1, retrying: 0, failed: 0 });
    expect(await kept({ messageId: owed[0].messageId })).toBe(1);
    await owed[0].reload();
    expect(owed[0].status).toBe('delivered');

    const again = await restartedDeliverer();
    expect(again.result).toMatchObject({ delivered: 0 });
    expect(await kept({ messageId: owed[0].messageId })).toBe(1);
  });
});

describe('the server killed after the mail server accepted a message, before recording it delivered', () => {
  it('sends it again only once its lease is over, and the mailbox holds it once', async () => {
    const message = await queueOne('Wendle test: accepted then killed');

    const killed = await child({ use: 'deliver-mail', stopAt: 'after-send' });
    expect(killed.stoppedAt, killed.output).toBe('after-send');
    await message.reload();
    expect(message.status).toBe('sending');
    expect(await kept({ messageId: message.messageId })).toBe(1);

    // Within the lease its sender may still be alive: nobody takes the message over.
    expect((await restartedDeliverer()).result).toMatchObject({ delivered: 0 });

    const later = await restartedDeliverer(SENDING_LEASE_MS + 1000);
    expect(later.result).toMatchObject({ delivered: 1 });
    await message.reload();
    expect([message.status, message.attempts]).toEqual(['delivered', 2]);
    expect(await kept({ messageId: message.messageId })).toBe(1);
  });
});

describe('a mail server that is unavailable or refuses', () => {
  it('retries a temporary failure after its backoff, not before, and then delivers', async () => {
    const message = await queueOne('Wendle test: server busy');
    const start = Date.now();
    const busy = Object.assign(new Error('451 Try again later'), { responseCode: 451 });
    expect(await deliverOutboundMail({ ids: [message.id], now: () => start, send: async () => Promise.reject(busy) })).toEqual({ delivered: 0, retrying: 1, failed: 0 });
    await message.reload();
    expect([message.status, message.attempts, message.nextAttemptAt, message.lastError]).toEqual(['pending', 1, start + retryDelayMs(1), '451 Try again later']);

    expect(await deliverOutboundMail({ ids: [message.id], now: () => start + retryDelayMs(1) - 1 })).toEqual({ delivered: 0, retrying: 0, failed: 0 });
    expect(await deliverOutboundMail({ ids: [message.id], now: () => start + retryDelayMs(1), send: sendMail })).toEqual({ delivered: 1, retrying: 0, failed: 0 });
    await message.reload();
    expect([message.status, message.attempts, message.bodyText]).toEqual(['delivered', 2, '']);
    expect(await kept({ messageId: message.messageId })).toBe(1);
  });

  it('gives up at once on a final refusal (a mailbox that cannot exist) and keeps the reason', async () => {
    const message = await queueOne('Wendle test: no such mailbox', 'nobody@harrowfield.invalid');
    expect(await deliverOutboundMail({ ids: [message.id] })).toEqual({ delivered: 0, retrying: 0, failed: 1 });
    await message.reload();
    expect(message.status).toBe('failed');
    expect(message.lastError).toMatch(/does not exist/);
    expect(await deliverOutboundMail({ ids: [message.id], now: () => Date.now() + 24 * 3600_000 })).toEqual({ delivered: 0, retrying: 0, failed: 0 });
  });

  it('leaves no half-written message file in the local outbox', async () => {
    const names = await readdir(dataDirectory('outbox'));
    expect(names.length).toBeGreaterThan(0);
    expect(names.filter((n) => !n.endsWith('.eml'))).toEqual([]);
    const rows = await OutboxMessage.findAll();
    expect(new Set(rows.map((r) => r.rawPath.split('/').pop()))).toEqual(new Set(names));
  });
});
