import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Revision } from '@/lib/db';
import { callRoute, completedDraft } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let revisionId: string;
beforeAll(async () => {
  db = await useTestDatabase();
  signedInAs((await createTestUser('designer')).sessionUser);
  revisionId = (await completedDraft()).revisionId;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const preview = (table: string, csv: string) => callRoute('uploads/routing-csv-preview', 'POST', { query: `revision=${revisionId}&table=${table}`, body: csv, headers: { 'content-type': 'text/csv', 'x-file-name': 'inflow.csv' } });

describe('reading a hydrograph or storage CSV for the reservoir step', () => {
  it('returns a hydrograph’s points and stores nothing', async () => {
    const before = (await Revision.findByPk(revisionId))!.inputsJson;
    const response = await preview('hydrograph', 'time,discharge\n0,3\n2,9\n4,14\n8,5\n');
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ table: 'hydrograph', rows: [{ time: 0, discharge: 3 }, { time: 2, discharge: 9 }, { time: 4, discharge: 14 }, { time: 8, discharge: 5 }] });
    expect((await Revision.findByPk(revisionId))!.inputsJson).toBe(before);
  });

  it('tells a storage table of areas from one of volumes by its heading', async () => {
    const areas = await (await preview('storage', 'level,area\n32.4,60000\n33.4,85000\n')).json();
    expect(areas).toMatchObject({ table: 'storage', kind: 'level-area', rows: [{ level: 32.4, area: 60000 }, { level: 33.4, area: 85000 }] });
    const volumes = await (await preview('storage', 'level,volume\n32.4,0\n33.4,72000\n')).json();
    expect(volumes).toMatchObject({ kind: 'level-volume', rows: [{ level: 32.4, volume: 0 }, { level: 33.4, volume: 72000 }] });
  });

  it('lists every bad line by its number, in words', async () => {
    const response = await preview('hydrograph', 'time,discharge\n0,3\n2,nine\n1,14\n');
    expect(response.status).toBe(400);
    const body = (await response.json()) as { error: string; issues: { path: string; message: string }[] };
    expect(body.error).toMatch(/^The hydrograph has \d problems?; the table on the page is unchanged\.$/);
    expect(body.issues).toContainEqual({ path: 'line 3', message: expect.stringContaining('"nine" is not a number') });
    expect(body.issues.every((i) => /^(line \d+|file)$/.test(i.path))).toBe(true);
  });

  it('refuses a table it does not know, naming the parameter', async () => {
    const response = await preview('rainfall', 'time,depth\n0,1\n');
    expect(response.status).toBe(400);
    expect(JSON.stringify(await response.json())).toContain('must be hydrograph or storage');
  });
});
