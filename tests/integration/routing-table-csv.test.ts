import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { caseFileText } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let schemeId: string;
beforeAll(async () => {
  db = await useTestDatabase();
  signedInAs((await createTestUser('designer')).sessionUser);
  const imported = await callRoute('schemes/import', 'POST', { body: caseFileText(), headers: { 'content-type': 'application/json', 'x-file-name': 'case.json' } });
  expect(imported.status).toBe(201);
  schemeId = ((await imported.json()) as { schemeId: string }).schemeId;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

describe('the routing table CSV', () => {
  it('refuses an event without an inflow hydrograph with 422, naming the event in words', async () => {
    const response = await callRoute('schemes/[id]/routing-table', 'GET', { id: schemeId, query: 'revision=1&event=0' });
    expect(response.status).toBe(422);
    const body = (await response.json()) as { error: string; issues: { path: string; message: string }[] };
    expect(body.error).toMatch(/has no inflow hydrograph routed through a reservoir/);
    expect(body.issues).toEqual([expect.objectContaining({ path: 'event', message: 'is not routed through a reservoir' })]);
  });

  it('refuses an event that does not exist with 400 naming the field', async () => {
    const response = await callRoute('schemes/[id]/routing-table', 'GET', { id: schemeId, query: 'revision=1&event=9' });
    expect(response.status).toBe(400);
    expect(JSON.stringify(await response.json())).toContain('event');
  });
});
