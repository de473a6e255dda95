import { mkdirSync, readdirSync, utimesSync, writeFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dataDirectory } from '@/lib/db/database-path';
import { storeOutboxMessage } from '@/lib/mail/store-outbox-message';
import { SWEEP_GRACE_MS, sweepUnreferencedFiles } from '@/lib/storage/sweep-unreferenced-files';
import { withStoredUpload } from '@/lib/uploads/store-upload';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => {
  db = await useTestDatabase();
});
afterAll(async () => db.cleanup());

const HOUR_AND_A_BIT = SWEEP_GRACE_MS + 5 * 60 * 1000;

function strayFile(folder: string, name: string, ageMs: number): string {
  mkdirSync(dataDirectory(folder), { recursive: true });
  const file = dataDirectory(folder, name);
  writeFileSync(file, 'left behind by a killed server');
  const at = (Date.now() - ageMs) / 1000;
  utimesSync(file, at, at);
  return name;
}

describe('sweeping stored files that no record refers to', () => {
  it('removes old unrecorded files in every data folder, and keeps recorded ones and young ones', async () => {
    const designer = (await createTestUser('designer')).user;
    const upload = await withStoredUpload(Buffer.from('distance,station,elevation\n'), { kind: 'survey-csv', originalName: 'survey.csv', mediaType: 'text/csv', schemeId: null, uploadedBy: designer.id }, async (_t, record) => record());
    const message = await storeOutboxMessage({ raw: Buffer.from('Message-ID: <kept@sillmark.local>\r\nSubject: kept\r\n\r\nbody'), envelopeFrom: 'a@sillmark.test', envelopeTo: ['b@sillmark.test'] });
    // Recorded files are kept however old they are.
    for (const file of [dataDirectory('uploads', upload.storedName), message.rawPath]) utimesSync(file, 0, 0);

    const old = {
      letters: strayFile('letters', '0b0d7a4e-3f8e-4d0c-9a57-1c1d2e3f4a5b.pdf', HOUR_AND_A_BIT),
      certificates: strayFile('certificates', '7c9e6679-7425-40de-944b-e07fc1f90ae7.pdf', HOUR_AND_A_BIT),
      uploads: strayFile('uploads', 'e3b0c442-98fc-4c14-9afb-f4c8996fb924.csv', HOUR_AND_A_BIT),
      outbox: strayFile('outbox', '9f86d081-884c-4d63-9a3c-2c0b3f1e4e5d.eml', HOUR_AND_A_BIT),
      plans: strayFile('plans', '1b4f0e98-51c7-4f38-a3a2-0b8c5f1d2e3a.geojson', HOUR_AND_A_BIT),
    };
    const young = strayFile('letters', '5d41402a-bc4b-4a76-b971-9d911017c592.pdf', 60 * 1000);

    const report = await sweepUnreferencedFiles();
    expect(report).toEqual({ letters: [old.letters], certificates: [old.certificates], uploads: [old.uploads], outbox: [old.outbox], plans: [old.plans] });
    expect(readdirSync(dataDirectory('letters'))).toEqual([young]);
    expect(readdirSync(dataDirectory('uploads'))).toEqual([upload.storedName]);
    expect(readdirSync(dataDirectory('outbox'))).toEqual([path.basename(message.rawPath)]);
    expect(readdirSync(dataDirectory('certificates'))).toEqual([]);
    expect(await sweepUnreferencedFiles()).toEqual({ letters: [], certificates: [], uploads: [], outbox: [], plans: [] });
  });

  it('runs as its own command at start and says what it removed', () => {
    strayFile('uploads', '2c26b46b-68ff-4c8a-8f2e-3a1b4c5d6e7f.json', HOUR_AND_A_BIT);
    const result = spawnSync('npm', ['run', '--silent', 'db:sweep-files'], { env: { ...process.env, DATABASE_PATH: db.file }, encoding: 'utf8' });
    expect(result.stderr).toBe('');
    expect(result.stdout).toMatch(/Removed files no record refers to: 1 in uploads\//);
  });
});
