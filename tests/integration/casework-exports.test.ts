import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateLettersAction } from '@/app/(portal)/liaison/[id]/letters/actions';
import { logLetterResponseAction } from '@/app/(portal)/liaison/[id]/letters/[letterId]/actions';
import { Letter, database } from '@/lib/db';
import { sendLetterBatch } from '@/lib/letters/send-letter-batch';
import { startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { createTestRevision, createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let schemeId: string;
const rowsOf = async (table: string) => {
  const response = await callRoute('parcels/[id]/export', 'GET', { id: schemeId, query: `table=${table}` });
  expect(response.status, table).toBe(200);
  expect(response.headers.get('content-disposition')).toMatch(/^attachment; filename=".+\.csv"$/);
  return parse(await response.text(), { columns: true }) as Record<string, string>[];
};

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  await startLocalSmtpServer(0);
  const liaison = (await createTestUser('liaison')).sessionUser;
  const designerId = (await createTestUser('designer')).user.id;
  schemeId = (await createTestScheme(designerId)).id;
  const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId: (await createTestUser('checker')).user.id, status: 'countersigned' });
  signedInAs(liaison);
  // An owner's name typed as a formula must open as text.
  const csv = demoParcelsCsv().toString('utf8').replace('Edith Lowther', '=SUM(A1) Lowther');
  expect((await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(Buffer.from(csv)), headers: { 'x-file-name': 'parcels.csv' } })).status).toBe(201);
  const made = await generateLettersAction({ schemeId, revisionId: revision.id });
  if (!made.ok) throw new Error(made.error);
  await sendLetterBatch({ user: liaison, batchId: made.data.batchId, input: { max: 20, retryFailed: false } });
  database();
  const letter = (await Letter.findOne({ where: { batchId: made.data.batchId, status: 'sent' } }))!;
  expect(await logLetterResponseAction({ letterId: letter.id, receivedOn: new Date().toISOString().slice(0, 10), responseType: 'objection', channel: 'post', summary: '-1 is what I think of it' })).toMatchObject({ ok: true });
});
afterAll(async () => {
  signedInAs(null);
  await stopLocalSmtpServer();
  await db.cleanup();
});

describe('the liaison officer’s CSV exports', () => {
  it('give the register with every parcel, formula-like text neutralised', async () => {
    const rows = await rowsOf('register');
    expect(rows).toHaveLength(9);
    expect(rows.find((r) => r.Parcel === 'HM-02')?.Owner).toBe("'=SUM(A1) Lowther");
    expect(rows.find((r) => r.Parcel === 'HM-01')).toMatchObject({ 'From (m upstream)': '20', Bank: 'right bank' });
  });

  it('give the impact table with one row per parcel and flood event', async () => {
    const rows = await rowsOf('impact');
    const events = new Set(rows.map((r) => r['Flood event']));
    expect(rows).toHaveLength(9 * events.size);
    expect(rows.some((r) => r.Impact === 'Affected' && Number(r['Greatest rise in level (m)']) > 0)).toBe(true);
  });

  it('give the tracking list: letter, status, sent, deadline and the latest response', async () => {
    const rows = await rowsOf('tracking');
    const answered = rows.filter((r) => r.Responses === '1');
    expect(answered).toHaveLength(1);
    expect(answered[0]).toMatchObject({ Status: 'Acknowledged', 'Latest response kind': 'Objection', 'Latest response by': 'Post', 'Latest response': "'-1 is what I think of it" });
    expect(rows.every((r) => /^\d{4}-\d{2}-\d{2}$/.test(r['Response due']))).toBe(true);
  });

  it('refuses an unknown table, naming it', async () => {
    const response = await callRoute('parcels/[id]/export', 'GET', { id: schemeId, query: 'table=owners' });
    expect(response.status).toBe(400);
    expect(JSON.stringify(await response.json())).toContain('table');
  });
});
