import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { caseFileText } from './support/liaison-fixtures';
import { parse } from 'csv-parse/sync';
import { RESERVOIR_STEP, callRoute, completedDraft } from './support/scheme-requests';
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

  it('writes a routed event step by step under its header block, times in hours, the peak inflow as entered', async () => {
    const { schemeId: routed, revisionId } = await completedDraft();
    expect((await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'reservoir', values: RESERVOIR_STEP } })).status).toBe(200);
    const response = await callRoute('schemes/[id]/routing-table', 'GET', { id: routed, query: 'revision=1&event=0' });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-disposition')).toMatch(/-rev1-event1-routing-table\.csv"$/);
    const rows = parse(await response.text(), { relax_column_count: true }) as string[][];
    expect(rows[0]).toEqual(['Sillmark routing table']);
    expect(rows.find((r) => r[0] === 'Event')?.[1]).toBe('50% AEP');
    expect(rows.find((r) => r[0] === 'Level datum')?.[1]).toBe('Wendle Valley local datum');
    const header = rows.findIndex((r) => r[0] === 'Time (h)');
    const data = rows.slice(header + 1).map((r) => r.map(Number));
    expect(data[0][0]).toBe(0);
    // The hydrograph entered runs 18 h and peaks at 14 m³/s at 4 h (RESERVOIR_STEP): the table covers it in hours, and
    // its inflow, read between the points entered at each time step, never exceeds that peak.
    expect(data.at(-1)![0]).toBeGreaterThanOrEqual(18);
    const inflow = data.map((r) => r[1]);
    expect(Math.max(...inflow)).toBeLessThanOrEqual(14);
    expect(Math.max(...inflow)).toBeGreaterThan(13);
    for (const row of data) expect(row.every(Number.isFinite)).toBe(true);
  });
});
