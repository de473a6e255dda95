import { readFileSync, readdirSync, existsSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Revision, Upload } from '@/lib/db';
import { uploadsDirectory } from '@/lib/uploads/store-upload';
import { SCHEME_STEP, callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

const DEMO_SURVEY = readFileSync('db/seeds/surveys/wendle-harrowfield-survey.csv');
const HEADER = 'distance_upstream,station,elevation,bank,manning_n';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let revisionId: string;

beforeAll(async () => {
  db = await useTestDatabase();
  designer = (await createTestUser('designer')).sessionUser;
  signedInAs(designer);
  revisionId = (await (await callRoute('schemes', 'POST', { json: SCHEME_STEP })).json()).revisionId;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const storedFiles = () => (existsSync(uploadsDirectory()) ? readdirSync(uploadsDirectory()) : []);

async function refused(route: 'uploads/survey' | 'uploads/survey-preview', body: BodyInit, headers: Record<string, string> = {}) {
  const before = await tableSnapshot();
  const files = storedFiles();
  const inputs = (await Revision.findByPk(revisionId))!.inputsJson;
  const response = await callRoute(route, 'POST', { query: `revision=${revisionId}`, body, headers: { 'content-type': 'text/csv', ...headers } });
  expect(await tableSnapshot()).toEqual(before);
  expect(storedFiles()).toEqual(files);
  expect((await Revision.findByPk(revisionId))!.inputsJson).toBe(inputs);
  return { status: response.status, body: (await response.json()) as { error: string; issues: { path: string; message: string }[] } };
}

const rows = (...lines: string[]) => [HEADER, ...lines].join('\n');
const section = (d: number, n = '0.035') => [`${d},0,12,,${n}`, `${d},5,10,,`, `${d},10,12,,`];

describe('bad survey CSV files are refused with the line and the reason, storing nothing', () => {
  it('wrong columns', async () => {
    const r = await refused('uploads/survey', 'chainage,offset,level\n0,0,12\n');
    expect(r.status).toBe(400);
    expect(r.body.issues).toContainEqual({ path: 'line 1', message: expect.stringContaining('column 1 "chainage" is not a survey column') });
    expect(r.body.issues).toContainEqual({ path: 'line 1', message: expect.stringContaining('the column distance_upstream is missing') });
  });

  it('text in a number', async () => {
    const r = await refused('uploads/survey', rows(...section(0), '100,0,12,,0.035', '100,5,ten,,', '100,10,12,,'));
    expect(r.status).toBe(400);
    expect(r.body.issues).toEqual([{ path: 'line 6', message: 'elevation "ten" is not a number (ground level, m above the datum)' }]);
  });

  it('distances that go back downstream', async () => {
    const r = await refused('uploads/survey', rows(...section(0), ...section(200), ...section(150)));
    expect(r.status).toBe(400);
    expect(r.body.issues[0]).toEqual({ path: 'line 8', message: expect.stringMatching(/^distance_upstream 150 m comes after 200 m on line 7/) });
  });

  it('fewer than three points in a section', async () => {
    const r = await refused('uploads/survey', rows(...section(0), '100,0,12,,0.035', '100,10,12,,'));
    expect(r.status).toBe(400);
    expect(r.body.issues).toEqual([{ path: 'line 5', message: 'the section at 100 m (lines 5–6) has 2 points; a cross-section needs at least three' }]);
  });

  it('a 50 MB file, streamed without a declared length, before it is read whole', async () => {
    const chunk = new TextEncoder().encode(`${'0,1,2,,0.03\n'.repeat(8738)}`);
    let sent = 0;
    const stream = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (sent >= 50 * 1024 * 1024) return controller.close();
        sent += chunk.byteLength;
        controller.enqueue(chunk);
      },
    });
    const r = await refused('uploads/survey', stream);
    expect(r.status).toBe(413);
    expect(r.body.error).toMatch(/may be at most 2\.0 MB\. Nothing was stored/);
    expect(sent).toBeLessThan(4 * 1024 * 1024);
  });

  it('a 50 MB file with its declared length, refused before reading', async () => {
    const r = await refused('uploads/survey-preview', 'x', { 'content-length': String(50 * 1024 * 1024) });
    expect(r.status).toBe(413);
    expect(r.body.error).toMatch(/The file is 50\.0 MB; a survey CSV may be at most 2\.0 MB/);
  });

  it('a spreadsheet workbook renamed .csv', async () => {
    const r = await refused('uploads/survey', new Uint8Array([0x50, 0x4b, 0x03, 0x04, 1, 2, 3]));
    expect(r.status).toBe(422);
    expect(r.body.error).toMatch(/spreadsheet workbook.*save the sheet as CSV/);
  });
});

describe('a good survey CSV', () => {
  it('is previewed without storing, then attached as the draft’s surveyed reach', async () => {
    const preview = await refused('uploads/survey-preview', DEMO_SURVEY);
    expect(preview.status).toBe(200);
    const { sections } = preview.body as unknown as { sections: { distanceUpstream: number; lines: number[] }[] };
    expect(sections.map((s) => s.distanceUpstream)).toEqual([0, 400, 900, 1500, 2200, 3000]);
    expect(sections[0].lines).toEqual([4, 14]);

    const response = await callRoute('uploads/survey', 'POST', { query: `revision=${revisionId}`, body: DEMO_SURVEY, headers: { 'content-type': 'text/csv', 'x-file-name': encodeURIComponent('../../etc/wendle survey.csv') } });
    expect(response.status).toBe(201);
    const { uploadId } = await response.json();
    const upload = (await Upload.findByPk(uploadId))!;
    expect(upload).toMatchObject({ kind: 'survey-csv', originalName: 'wendle survey.csv', sizeBytes: DEMO_SURVEY.byteLength });
    expect(upload.storedName).toMatch(/^[0-9a-f-]{36}\.csv$/);
    expect(storedFiles()).toEqual([upload.storedName]);
    const inputs = JSON.parse((await Revision.findByPk(revisionId))!.inputsJson);
    expect(inputs.reach.kind).toBe('surveyed');
    expect(inputs.reach.sections[0]).toEqual({ distanceUpstream: 0, points: expect.any(Array), manningN: { left: 0.06, channel: 0.035, right: 0.05 }, bankStations: [27, 44] });
    expect(inputs.wizard.survey).toMatchObject({ uploadId, rowCount: 66 });
  });

  it('carries the wizard on to an evaluated surveyed reach', async () => {
    for (const [step, values] of [
      ['flows', { events: [{ name: '1% AEP', discharge: 30 }], governing: 'all' }],
      ['structure', { control: { type: 'weir', kind: 'broad-crested', crestLength: 11, sillHeight: 0.9, crestBreadth: 3.5, noseShape: 'square-edged', approachVelocity: true } }],
      ['limits', { sectionBankLevels: [null, null, 34.3, null, null, null], impactThreshold: 0.01, limits: [{ label: 'Wendle Meadows footpath', distanceUpstream: 2200, maxLevel: 35.6, freeboard: 0 }] }],
    ] as const) {
      const saved = await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step, values } });
      expect(saved.status, await saved.clone().text()).toBe(200);
    }
    const evaluated = await callRoute('evaluate', 'POST', { json: { revisionId } });
    expect(evaluated.status, await evaluated.clone().text()).toBe(200);
    const { result, input } = await evaluated.json();
    expect(input.reach.sections[2].bankLevel).toBe(34.3);
    expect(result.events[0].profile.length).toBeGreaterThan(3);
    expect(result.events[0].inundation).not.toBeNull();
  });
});
