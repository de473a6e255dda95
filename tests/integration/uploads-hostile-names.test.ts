import { existsSync, readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { Upload } from '@/lib/db';
import { dataDirectory } from '@/lib/db/database-path';
import { uploadsDirectory } from '@/lib/uploads/store-upload';
import { caseFileText, demoParcelsCsv } from './support/liaison-fixtures';
import { usePortalWorld, type Person, type PortalWorld } from './support/portal-world';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';

// Uploads of every kind (survey CSV, parcels CSV, case file): a hostile file name is only a label, the bytes decide
// the type, the size is bounded, and the files land under a random name in the data directory, never in public/.
// (schemes-survey-upload.test.ts covers the survey's CSV problems, a workbook renamed .csv and the 50 MB stream.)

const portal = usePortalWorld();

type Kind = 'survey' | 'parcels' | 'case';
const KINDS: Record<Kind, { route: string; who: Person; id?: (w: PortalWorld) => string; query?: (w: PortalWorld) => string; body: () => Uint8Array<ArrayBuffer>; type: string; ext: string; limit: number }> = {
  survey: { route: 'uploads/survey', who: 'designer', query: (w) => `revision=${w.draft.revisionId}`, body: () => new Uint8Array(readFileSync('db/seeds/surveys/wendle-harrowfield-survey.csv')), type: 'text/csv', ext: 'csv', limit: 2 * 1024 * 1024 },
  parcels: { route: 'parcels/[id]/csv', who: 'liaison', id: (w) => w.certified.schemeId, body: () => new Uint8Array(demoParcelsCsv()), type: 'text/csv', ext: 'csv', limit: 2 * 1024 * 1024 },
  case: { route: 'schemes/import', who: 'designer', body: () => new TextEncoder().encode(caseFileText()), type: 'application/json', ext: 'json', limit: 1024 * 1024 },
};

function upload(kind: Kind, body: BodyInit, headers: Record<string, string> = {}) {
  const k = KINDS[kind];
  signedInAs(portal.world.people[k.who].sessionUser);
  return callRoute(k.route, 'POST', { id: k.id?.(portal.world), query: k.query?.(portal.world), body, headers: { 'content-type': k.type, ...headers } });
}

const HOSTILE_NAMES = ['../../etc/passwd', '..\\x.csv', '%2e%2e%2f%2e%2e%2fetc%2fpasswd', '/var/lib/sillmark/evil.csv', 'C:\\Windows\\System32\\evil.csv', 'nul\u0000byte.csv', `${'a'.repeat(5000)}.csv`, '....//....//x', '%E0%A4%A'];
const stored = () => (existsSync(uploadsDirectory()) ? readdirSync(uploadsDirectory()) : []);

describe.each(Object.keys(KINDS) as Kind[])('%s upload', (kind) => {
  it('stores a file with a hostile name under a random name inside the data directory; the name is only a label', async () => {
    const dataFiles = readdirSync(dataDirectory());
    for (const name of HOSTILE_NAMES) {
      const response = await upload(kind, KINDS[kind].body(), { 'x-file-name': encodeURIComponent(name).replace(/%25/g, '%') });
      expect(response.status, `${name}: ${await response.clone().text()}`).toBe(201);
      const row = (await Upload.findOne({ order: [['createdAt', 'DESC'], ['id', 'DESC']] }))!;
      expect(row.storedName).toMatch(new RegExp(`^[0-9a-f-]{36}\\.${KINDS[kind].ext}$`));
      expect(path.resolve(uploadsDirectory(), row.storedName).startsWith(`${uploadsDirectory()}${path.sep}`)).toBe(true);
      expect(row.originalName).not.toMatch(/[\\/\u0000]/);
      expect(row.originalName.length).toBeLessThanOrEqual(200);
    }
    expect(readdirSync(dataDirectory()).filter((f) => !dataFiles.includes(f)).every((f) => ['uploads'].includes(f))).toBe(true);
    expect(stored().every((f) => /^[0-9a-f-]{36}\.(csv|json)$/.test(f))).toBe(true);
    expect(existsSync(path.resolve(dataDirectory(), '..', 'etc')) || existsSync(path.resolve(dataDirectory(), 'evil.csv'))).toBe(false);
  });

  it('refuses a PNG or a ZIP renamed to the right extension, storing nothing', async () => {
    for (const bytes of [[0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0], [0x50, 0x4b, 0x03, 0x04, 0x14, 0, 0, 0]]) {
      const before = await tableSnapshot();
      const files = stored();
      const response = await upload(kind, new Uint8Array(bytes), { 'x-file-name': `survey.${KINDS[kind].ext}` });
      expect(response.status).toBe(422);
      expect((await response.json()).error).toMatch(/PNG image|ZIP archive/);
      expect(await tableSnapshot()).toEqual(before);
      expect(stored()).toEqual(files);
    }
  });

  it('refuses a file over the size limit with 413, storing nothing', async () => {
    const before = await tableSnapshot();
    const files = stored();
    const response = await upload(kind, new Uint8Array(KINDS[kind].limit + 1).fill(0x41));
    expect(response.status).toBe(413);
    expect(await tableSnapshot()).toEqual(before);
    expect(stored()).toEqual(files);
  });
});

it('keeps uploads beside the database, never under public/', () => {
  const publicDir = path.resolve('public');
  expect(uploadsDirectory().startsWith(publicDir)).toBe(false);
  expect(path.dirname(uploadsDirectory())).toBe(path.dirname(path.resolve(process.env.DATABASE_PATH!)));
  const publicFiles = existsSync(publicDir) ? readdirSync(publicDir, { recursive: true }).map(String) : [];
  expect(publicFiles.filter((f) => /[0-9a-f]{8}-[0-9a-f]{4}-/.test(f) || /\.(csv|json)$/.test(f))).toEqual([]);
});
