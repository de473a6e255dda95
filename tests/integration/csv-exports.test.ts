import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { caseFileText } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// Issue 14 §10: text a designer typed must open in a spreadsheet as text, never run as a formula (OWASP, "CSV Injection").

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => {
  db = await useTestDatabase();
  signedInAs((await createTestUser('designer')).sessionUser);
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const HOSTILE_NAMES = ['=HYPERLINK("http://example.org","1% AEP")', '+1% AEP', '-1% AEP', '@SUM(1% AEP)'];

describe('the step table CSV', () => {
  it('writes event names that start with = + - @ as text, and levels and slopes as plain numbers', async () => {
    const demo = JSON.parse(caseFileText()) as { events: { name: string }[] };
    const events = HOSTILE_NAMES.map((name, i) => ({ ...demo.events[i % demo.events.length], name }));
    const imported = await callRoute('schemes/import', 'POST', { body: JSON.stringify({ ...demo, events }), headers: { 'content-type': 'application/json', 'x-file-name': 'case.json' } });
    expect(imported.status).toBe(201);
    const { schemeId } = (await imported.json()) as { schemeId: string };
    for (const [index, name] of HOSTILE_NAMES.entries()) {
      const response = await callRoute('schemes/[id]/step-table', 'GET', { id: schemeId, query: `revision=1&event=${index}` });
      expect(response.status).toBe(200);
      const all = parse(await response.text(), { relax_column_count: true, skip_empty_lines: true }) as string[][];
      // The header block names the event too, neutralised like the rows.
      expect(all.find((row) => row[0] === 'Event' && row.length === 2)).toEqual(['Event', `'${name}`]);
      const rows = all.slice(all.findIndex((row) => row[0] === 'Event' && row.length > 2));
      expect(rows.length).toBeGreaterThan(2);
      for (const row of rows.slice(1)) {
        expect(row[0]).toBe(`'${name}`);
        for (const number of row.slice(1)) expect(Number.isFinite(Number(number)), `${number} is a plain number`).toBe(true);
      }
    }
  });
});
