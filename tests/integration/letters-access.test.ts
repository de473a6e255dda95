import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Letter, database } from '@/lib/db';
import { startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { generateLettersAction } from '@/app/(portal)/liaison/[id]/letters/actions';
import { saveParcelEditsAction } from '@/app/(portal)/liaison/[id]/register/actions';
import { createTestRevision, createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type SessionUser = Awaited<ReturnType<typeof createTestUser>>['sessionUser'];

let db: Awaited<ReturnType<typeof useTestDatabase>>;
const people = {} as Record<'liaison' | 'designer' | 'otherDesigner' | 'checker' | 'otherChecker' | 'planning' | 'admin', SessionUser>;
let schemeId: string;
let revisionId: string;
let batchId: string;
let letterId: string;

const OWNER = 'Edith Lowther';

beforeAll(async () => {
  db = await useTestDatabase();
  await startLocalSmtpServer(0);
  for (const [key, role] of [['liaison', 'liaison'], ['designer', 'designer'], ['otherDesigner', 'designer'], ['checker', 'checker'], ['otherChecker', 'checker'], ['planning', 'planning'], ['admin', 'admin']] as const) {
    people[key] = (await createTestUser(role)).sessionUser;
  }
  schemeId = (await createTestScheme(people.designer.id)).id;
  revisionId = (await createTestRevision({ schemeId, authorId: people.designer.id, checkerId: people.checker.id, status: 'countersigned' })).id;
  signedInAs(people.liaison);
  expect((await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(demoParcelsCsv()) })).status).toBe(201);
  const generated = await generateLettersAction({ schemeId, revisionId });
  if (!generated.ok) throw new Error(generated.error);
  batchId = generated.data.batchId;
  database();
  letterId = (await Letter.findOne({ where: { batchId } }))!.id;
});
afterAll(async () => {
  signedInAs(null);
  await stopLocalSmtpServer();
  await db.cleanup();
});

const readers = () => [
  ['register', () => callRoute('parcels/[id]', 'GET', { id: schemeId })],
  ['impact', () => callRoute('parcels/[id]/impact', 'GET', { id: schemeId })],
  ['batch progress', () => callRoute('letters/batches/[id]', 'GET', { id: batchId })],
  ['letter PDF', () => callRoute('letters/[id]', 'GET', { id: letterId })],
] as const;

describe('owner details are seen only by liaison, admin, and the scheme’s own designer and checker', () => {
  for (const who of ['liaison', 'admin', 'designer', 'checker'] as const) {
    it(`${who} reads the register, impact, progress and letters of the scheme`, async () => {
      signedInAs(people[who]);
      for (const [what, call] of readers()) expect((await call()).status, what).toBe(200);
      signedInAs(people[who]);
      expect(await (await callRoute('parcels/[id]', 'GET', { id: schemeId })).text()).toContain(OWNER);
    });
  }

  it('a planning officer is refused every one of them and never gets an owner’s name', async () => {
    signedInAs(people.planning);
    for (const [what, call] of readers()) {
      const response = await call();
      expect(response.status, what).toBe(403);
      expect(await response.text()).not.toContain(OWNER);
    }
  });

  for (const who of ['otherDesigner', 'otherChecker'] as const) {
    it(`a ${who === 'otherDesigner' ? 'designer' : 'checker'} of other schemes is told the scheme does not exist`, async () => {
      signedInAs(people[who]);
      for (const [what, call] of readers()) {
        const response = await call();
        expect(response.status, what).toBe(404);
        expect(await response.text()).not.toContain(OWNER);
      }
    });
  }
});

describe('only the liaison officer changes the register and sends letters', () => {
  it('the scheme’s designer, without the liaison role, cannot send, generate, upload or edit; nothing changes', async () => {
    const before = await tableSnapshot();
    signedInAs(people.designer);
    expect((await callRoute('letters/batches/[id]/send', 'POST', { id: batchId, json: { max: 5 } })).status).toBe(403);
    expect(await generateLettersAction({ schemeId, revisionId })).toMatchObject({ ok: false, status: 403 });
    expect((await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(demoParcelsCsv()) })).status).toBe(403);
    expect(await saveParcelEditsAction({ schemeId, baseRegisterId: 'x', note: '', parcels: [] })).toMatchObject({ ok: false, status: 403 });
    expect(await tableSnapshot()).toEqual(before);
    expect(await Letter.count({ where: { batchId, status: 'queued' } })).toBeGreaterThan(0);
  });

  it('an admin may read but not send', async () => {
    signedInAs(people.admin);
    expect((await callRoute('letters/batches/[id]/send', 'POST', { id: batchId, json: { max: 5 } })).status).toBe(403);
  });

  it('the liaison officer sends', async () => {
    signedInAs(people.liaison);
    const response = await callRoute('letters/batches/[id]/send', 'POST', { id: batchId, json: { max: 1 } });
    expect(response.status).toBe(200);
    expect((await response.json()).counts.sent).toBe(1);
  });
});
