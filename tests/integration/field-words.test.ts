import { renderToStaticMarkup } from 'react-dom/server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Revision } from '@/lib/db';
import { frozenCaseFile } from '@/lib/revisions/revision-hashes';
import { listRevisionHistory } from '@/lib/revisions/list-revision-history';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { InputsTable } from '@/app/(portal)/checks/_components/inputs-table';
import { rawFieldPaths } from '../support/raw-field-paths';
import { createTestScheme, demoCase } from './support/scheme-factory';
import { LIMITS_STEP, callRoute, completedDraft } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];

beforeAll(async () => {
  db = await useTestDatabase();
  designer = (await createTestUser('designer')).sessionUser;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

type Issue = { path: string; label?: string; message: string };
const importCase = (body: string) => callRoute('schemes/import', 'POST', { body, headers: { 'content-type': 'application/json', 'x-file-name': 'case.json' } });

const HUGE = 'x'.repeat(200_000);
const badCase = {
  format: 'sillmark-case',
  version: 1,
  reach: { kind: 'prismatic', section: { shape: 'rectangular', width: 8 }, manningN: 0.035, bedSlope: 0.001, length: 2000, bedLevelAtControl: 30 },
  events: [{ name: '1% AEP', discharge: -5 }, { name: 123, discharge: 20 }],
  control: { type: 'weir', kind: HUGE, sillHeight: 1, crestLength: 8 },
  limits: [{ label: 'Mill Lane cottages', distanceUpstream: -10, maxLevel: 33 }],
};

describe('fields named in words, never by their paths', () => {
  it('refuses a case file naming each field, list items by their own names, with short messages and nothing stored', async () => {
    signedInAs(designer);
    const before = await tableSnapshot();
    const response = await importCase(JSON.stringify(badCase));
    expect(response.status).toBe(400);
    const { issues } = (await response.json()) as { issues: Issue[] };
    const messages = issues.map((i) => i.message);
    expect(messages).toContain('Flood event “1% AEP”: peak discharge must be greater than 0 m³/s');
    expect(messages).toContain('Flood-level limit “Mill Lane cottages”: distance upstream must be 0 m or more');
    expect(messages).toContain('Flood event 2: name must be text');
    expect(messages.some((m) => m.startsWith('Proposed structure: kind of weir must be one of'))).toBe(true);
    for (const m of messages) {
      expect(rawFieldPaths(m), m).toEqual([]);
      expect(m.length, m.slice(0, 80)).toBeLessThan(300);
    }
    // The machine path stays for programs.
    expect(issues.map((i) => i.path)).toContain('limits[0].distanceUpstream');
    expect(await tableSnapshot()).toEqual(before);
  });

  it('says what is wrong with another kind of file in words', async () => {
    signedInAs(designer);
    for (const text of ['{"format": "something-else"}', '{"version": 1}', 'not json at all', `{"format": "sillmark-case", "version": 2}`]) {
      const { issues } = (await (await importCase(text)).json()) as { issues: Issue[] };
      for (const i of issues) expect(rawFieldPaths(i.message), i.message).toEqual([]);
    }
  });

  it('names a refused wizard field by its limit’s own name, and a refused scheme name “must be text”', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const limits = [{ ...LIMITS_STEP.limits[0], label: 'Mill Lane cottages', distanceUpstream: -1 }];
    const response = await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'limits', values: { ...LIMITS_STEP, limits } } });
    expect(response.status).toBe(400);
    const { issues } = (await response.json()) as { issues: Issue[] };
    expect(issues).toContainEqual({ path: 'limits[0].distanceUpstream', label: 'flood-level limit “Mill Lane cottages”: distance upstream', message: 'must be 0 m or more' });
    const named = await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'scheme', values: { name: 123, watercourse: 'River Wendle', site: 'Harrowfield Mill', datum: 'local datum', units: 'SI' } } });
    expect((await named.json()).issues).toContainEqual({ path: 'name', label: 'name of the scheme', message: 'must be text' });
  });

  it('names the structure’s fields in words in the live head preview', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const response = await callRoute('head-preview', 'POST', { json: { revisionId, control: { type: 'weir', kind: 'broad-crested', sillHeight: -1 } } });
    expect(response.status).toBe(400);
    const { issues } = (await response.json()) as { issues: Issue[] };
    expect(issues.map((i) => i.message)).toContain('Proposed structure: sill height above the bed must be 0 m or more');
    for (const i of issues) expect(rawFieldPaths(i.message), i.message).toEqual([]);
  });

  it('names what is missing in words when an unfinished draft is submitted for check', async () => {
    const checker = await createTestUser('checker');
    const { revision } = await createTestScheme(designer.id, demoCase(undefined, (c) => {
      delete c.control;
      (c.limits as { distanceUpstream: unknown }[])[0].distanceUpstream = 'far';
    }));
    const refusal = await submitForCheck({ revisionId: revision.id, checkerId: checker.user.id, designer, baseUrl: 'http://localhost:3000' }).then(
      () => null,
      (error: { issues: Issue[] }) => error.issues,
    );
    expect(refusal?.map((i) => i.message)).toEqual(expect.arrayContaining(['Proposed structure is required', expect.stringMatching(/^Flood-level limit “[^”]+”: distance upstream must be a number \(m\)$/)]));
    for (const i of refusal ?? []) expect(rawFieldPaths(i.message), i.message).toEqual([]);
  });

  it('shows the inputs table and the history of a draft in words', async () => {
    signedInAs(designer);
    const { schemeId, revisionId } = await completedDraft();
    const revision = (await Revision.findByPk(revisionId))!;
    const html = renderToStaticMarkup(InputsTable({ inputs: frozenCaseFile(revision.inputsJson) }));
    expect(html).toContain('flood-level limit “Mill Lane bridge soffit”: highest allowed level');
    expect(html).toContain('proposed structure: sill height above the bed');
    expect(html).toContain('1.2 m above the bed');
    expect(rawFieldPaths(html)).toEqual([]);
    const [history] = await listRevisionHistory(schemeId, designer);
    const summaries = history.entries.map((e) => e.summary);
    expect(summaries.some((s) => s.includes('flood event “1% AEP”: peak discharge'))).toBe(true);
    for (const s of summaries) expect(rawFieldPaths(s), s).toEqual([]);
  });
});
