import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Revision, Scheme } from '@/lib/db';
import { callRoute, completedDraft } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let planning: typeof designer;

beforeAll(async () => {
  db = await useTestDatabase();
  designer = (await createTestUser('designer')).sessionUser;
  planning = (await createTestUser('planning')).sessionUser;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const importCase = (body: BodyInit, name = 'case.json') => callRoute('schemes/import', 'POST', { body, headers: { 'content-type': 'application/json', 'x-file-name': name } });

describe('a scheme as a case file', () => {
  it('exports the draft as a case file and imports it back as a new scheme with the same inputs', async () => {
    signedInAs(designer);
    const { schemeId, revisionId } = await completedDraft();
    const exported = await callRoute('schemes/[id]/case-file', 'GET', { id: schemeId });
    expect(exported.status).toBe(200);
    expect(exported.headers.get('content-disposition')).toMatch(/attachment; filename="SM-\d{4}-rev1\.sillmark\.json"/);
    const text = await exported.text();
    const file = JSON.parse(text);
    expect(file).toMatchObject({ format: 'sillmark-case', version: 1, units: 'SI', scheme: { watercourse: 'River Wendle', datum: 'Wendle Valley local datum', governing: 1 } });
    expect(file.wizard).toBeUndefined();

    const imported = await importCase(text, 'harrowfield.sillmark.json');
    expect(imported.status).toBe(201);
    const { schemeId: copyId, revisionId: copyRevision } = await imported.json();
    expect(copyId).not.toBe(schemeId);
    const copy = (await Scheme.findByPk(copyId))!;
    expect(copy).toMatchObject({ name: file.scheme.name, watercourse: 'River Wendle', designerId: designer.id });
    const original = JSON.parse((await Revision.findByPk(revisionId))!.inputsJson);
    const again = JSON.parse((await Revision.findByPk(copyRevision))!.inputsJson);
    for (const part of ['reach', 'events', 'control', 'limits', 'sizing', 'impactThreshold']) expect(again[part], part).toEqual(original[part]);
    expect(again.wizard).toMatchObject({ datum: 'Wendle Valley local datum', governing: 1 });
  });

  it('imports a demo case file written by hand', async () => {
    signedInAs(designer);
    const response = await importCase(readFileSync('db/seeds/cases/wendle-harrowfield-surveyed-broad-crested.json'));
    expect(response.status).toBe(201);
    const { revisionId } = await response.json();
    const evaluated = await callRoute('evaluate', 'POST', { json: { revisionId } });
    expect(evaluated.status).toBe(200);
  });

  it('refuses a case file with problems, naming each field, and stores nothing', async () => {
    signedInAs(designer);
    const before = await tableSnapshot();
    const bad = { format: 'sillmark-case', version: 1, reach: { kind: 'prismatic', section: { shape: 'rectangular', width: 0 }, manningN: 0.03, bedSlope: 0.001, length: 500, bedLevelAtControl: 10 }, events: [], control: { type: 'weir', kind: 'broad-crested', sillHeight: 1 } };
    const response = await importCase(JSON.stringify(bad));
    expect(response.status).toBe(400);
    const { issues } = await response.json();
    expect(issues).toEqual(
      expect.arrayContaining([
        { path: 'reach.section.width', message: 'Channel: width must be greater than 0 m' },
        { path: 'events', message: 'Flood events must list at least one flood event' },
        { path: 'control.crestLength', message: 'Proposed structure: crest length is required' },
      ]),
    );
    expect((await importCase('{"format": "something-else"}')).status).toBe(400);
    expect((await importCase('not json at all')).status).toBe(400);
    expect(await tableSnapshot()).toEqual(before);
  });
});

describe('the results sheet downloads', () => {
  it('gives the step table as CSV with units, and a DRAFT calculation sheet with the caution', async () => {
    signedInAs(designer);
    const { schemeId } = await completedDraft();
    const csv = await callRoute('schemes/[id]/step-table', 'GET', { id: schemeId, query: 'revision=1&event=1' });
    expect(csv.status).toBe(200);
    const lines = (await csv.text()).trim().split('\r\n');
    // The header block: what the table is, then the column headings and one row per point, rounded as the trade reads them.
    expect(lines[0]).toBe('Step table,the with-scheme profile point by point');
    expect(lines).toContain('Revision,1');
    expect(lines).toContain('Event,1% AEP');
    expect(lines.some((l) => /^Design discharge,[\d.]+,m³\/s$/.test(l))).toBe(true);
    expect(lines.some((l) => /^Engine version,\d+\.\d+\.\d+/.test(l))).toBe(true);
    const heading = lines.findIndex((l) => l.startsWith('Event,Distance'));
    expect(lines[heading]).toMatch(/^Event,Distance upstream \(m\),Bed level \(m above [^)]+\),Depth \(m\),Water level with the scheme \(m above [^)]+\),Water level without the scheme \(m above [^)]+\),Afflux \(m\),Energy level \(m above [^)]+\),Velocity \(m\/s\),Froude number,Friction slope \(m\/m\)$/);
    const rows = lines.slice(heading + 1).map((l) => l.split(','));
    expect(rows.length).toBeGreaterThan(10);
    expect(rows[0].slice(0, 2)).toEqual(['1% AEP', '0']);
    for (const row of rows) {
      for (const level of row.slice(2, 8)) expect(level).toMatch(/^-?\d+(\.\d{1,3})?$/);
      // The afflux is the with-scheme level less the without-scheme one; each is rounded on its own, so within 1 mm.
      expect(Math.abs(Number(row[6]) - (Number(row[4]) - Number(row[5])))).toBeLessThanOrEqual(0.0010001);
    }
    expect(new Set(rows.map((r) => r.join(','))).size).toBe(rows.length);

    const pdf = await callRoute('schemes/[id]/calculation-sheet', 'GET', { id: schemeId });
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get('content-type')).toBe('application/pdf');
    const bytes = Buffer.from(await pdf.arrayBuffer());
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    mkdirSync('tests/.artifacts', { recursive: true });
    const file = path.join('tests/.artifacts', 'draft-calculation-sheet.pdf');
    writeFileSync(file, bytes);
    const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('DRAFT');
    expect(text).toMatch(/never replace, the judgement of a licensed engineer/);
    expect(text).toContain('Step table: 1% AEP');
    const fonts = execFileSync('pdffonts', [file], { encoding: 'utf8' });
    expect(fonts).toMatch(/IBMPlexSans/);
    expect(fonts).toMatch(/IBMPlexMono/);
  });

  it('shows a planning officer nothing of an uncertified scheme', async () => {
    signedInAs(designer);
    const { schemeId } = await completedDraft();
    signedInAs(planning);
    expect((await callRoute('schemes/[id]/case-file', 'GET', { id: schemeId })).status).toBe(404);
    expect((await callRoute('schemes/[id]/calculation-sheet', 'GET', { id: schemeId })).status).toBe(404);
  });
});
