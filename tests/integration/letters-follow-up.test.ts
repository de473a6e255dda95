import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateLettersAction, markPostedAction } from '@/app/(portal)/liaison/[id]/letters/actions';
import { editLetterResponseAction, logLetterResponseAction, makeReminderAction } from '@/app/(portal)/liaison/[id]/letters/[letterId]/actions';
import { GET as reminderPdf } from '@/app/api/letters/reminders/[id]/route';
import { Letter, LetterReminder, LetterResponseEdit, OutboundMessage, database } from '@/lib/db';
import { addDays, calendarDateIn } from '@/lib/dates/calendar-dates';
import { loadRoleHome } from '@/lib/home/load-role-home';
import { listFollowUp } from '@/lib/letters/list-follow-up';
import { loadLetterDetail } from '@/lib/letters/load-letter';
import { sendLetterBatch } from '@/lib/letters/send-letter-batch';
import { startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { createTestRevision, createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let liaison: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let letters: Letter[];
const today = new Date().toISOString().slice(0, 10);

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  await startLocalSmtpServer(0);
  liaison = (await createTestUser('liaison')).sessionUser;
  const designerId = (await createTestUser('designer')).user.id;
  const schemeId = (await createTestScheme(designerId)).id;
  const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId: (await createTestUser('checker')).user.id, status: 'countersigned' });
  signedInAs(liaison);
  // HM-02 has no e-mail address in this register: its letter goes by post.
  const csv = demoParcelsCsv().toString('utf8').replace('edith.lowther@weirmeadow.test', '');
  expect((await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(Buffer.from(csv)), headers: { 'x-file-name': 'parcels.csv' } })).status).toBe(201);
  const made = await generateLettersAction({ schemeId, revisionId: revision.id });
  if (!made.ok) throw new Error(made.error);
  for (let i = 0; i < 10; i++) if ((await sendLetterBatch({ user: liaison, batchId: made.data.batchId, input: { max: 5, retryFailed: false } })).counts.queued === 0) break;
  database();
  letters = await Letter.findAll({ where: { batchId: made.data.batchId }, order: [['createdAt', 'ASC']] });
});
afterAll(async () => {
  signedInAs(null);
  await stopLocalSmtpServer();
  await db.cleanup();
});

describe('response deadlines', () => {
  it('gives every letter the template’s 28 days from its date, and lists it as overdue once that day has passed', async () => {
    for (const l of letters) expect(l.responseDueOn).toBe(addDays(calendarDateIn('Europe/London', l.createdAt), 28));
    expect(await listFollowUp({ today })).toEqual([]);
    const overdue = await listFollowUp({ today: addDays(today, 29) });
    expect(overdue.map((f) => f.standing)).toEqual(letters.filter((l) => l.status === 'sent').map(() => 'overdue'));
    expect((await listFollowUp({ today: addDays(today, 25) })).every((f) => f.standing === 'due-soon')).toBe(true);
  });

  it('shows overdue letters on the liaison officer’s home, linked to the letter', async () => {
    const [first] = letters.filter((l) => l.status === 'sent');
    await first.update({ responseDueOn: addDays(today, -3) });
    const home = await loadRoleHome(liaison);
    const section = home.sections.find((s) => s.heading === 'Letters overdue for a response')!;
    expect(section.items).toHaveLength(1);
    expect(section.items[0]).toMatchObject({ id: first.id, status: 'overdue', href: expect.stringContaining(`/letters/${first.id}`) });
  });
});

describe('responses', () => {
  it('are typed and sent by a channel, cannot be dated before the letter went out, and keep their history when edited', async () => {
    const letter = letters.find((l) => l.status === 'sent')!;
    const early = await logLetterResponseAction({ letterId: letter.id, receivedOn: addDays(today, -1), responseType: 'objection', channel: 'post', summary: 'Objects to any rise at the mill.' });
    expect(early).toMatchObject({ ok: false, issues: [{ path: 'receivedOn', message: expect.stringMatching(/on or after .*sent/) }] });
    const badType = await logLetterResponseAction({ letterId: letter.id, receivedOn: today, responseType: 'complaint', channel: 'post', summary: 'Objects.' });
    expect(badType).toMatchObject({ ok: false, issues: [{ path: 'responseType' }] });
    const logged = await logLetterResponseAction({ letterId: letter.id, receivedOn: today, responseType: 'question', channel: 'telephone', summary: 'Asked about the gateway.' });
    if (!logged.ok) throw new Error(logged.error);
    const edited = await editLetterResponseAction({ responseId: logged.data.responseId, receivedOn: today, responseType: 'objection', channel: 'meeting', summary: 'At the meeting: objects to any rise at the gateway.' });
    expect(edited).toMatchObject({ ok: true });
    const detail = await loadLetterDetail({ user: liaison, letterId: letter.id });
    expect(detail.responses[0]).toMatchObject({ responseType: 'objection', channel: 'meeting', summary: expect.stringMatching(/^At the meeting/) });
    expect(detail.responses[0].earlier).toEqual([expect.objectContaining({ responseType: 'question', channel: 'telephone', summary: 'Asked about the gateway.' })]);
    expect(await LetterResponseEdit.count()).toBe(1);
    expect(await makeReminderAction({ letterId: letter.id })).toMatchObject({ ok: false, error: expect.stringMatching(/has responded/) });
  });
});

describe('reminders', () => {
  it('e-mails a reminder through the outbox for an unanswered e-mailed letter, moving its deadline on a fortnight', async () => {
    const letter = letters.filter((l) => l.status === 'sent')[1];
    const made = await makeReminderAction({ letterId: letter.id });
    expect(made).toMatchObject({ ok: true, data: { channel: 'email', respondBy: addDays(today, 14) } });
    const reminder = (await LetterReminder.findOne({ where: { letterId: letter.id } }))!;
    const mail = (await OutboundMessage.findByPk(reminder.outboundMessageId!))!;
    expect(mail).toMatchObject({ purpose: 'letter-reminder', recipient: letter.recipientEmail, status: 'delivered', subject: expect.stringMatching(/^Reminder: /) });
    expect((await letter.reload()).responseDueOn).toBe(addDays(today, 14));
  });

  it('makes a reminder letter to post for a posted letter, printable as a PDF', async () => {
    const letter = letters.find((l) => l.status === 'to-post')!;
    expect(await makeReminderAction({ letterId: letter.id })).toMatchObject({ ok: false, error: expect.stringMatching(/sent or posted/) });
    expect(await markPostedAction({ letterId: letter.id, postedOn: today })).toMatchObject({ ok: true });
    const made = await makeReminderAction({ letterId: letter.id });
    if (!made.ok) throw new Error(made.error);
    expect(made.data.channel).toBe('post');
    const response = await reminderPdf(new Request('http://localhost/'), { params: Promise.resolve({ id: made.data.reminderId }) });
    expect(response.status).toBe(200);
    expect(Buffer.from(await response.arrayBuffer()).subarray(0, 5).toString()).toBe('%PDF-');
  });
});
