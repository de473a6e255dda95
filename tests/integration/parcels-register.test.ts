import { readdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Parcel, ParcelRegister, database } from '@/lib/db';
import { listRegisterHistory } from '@/lib/parcels/list-register-history';
import { loadParcelRegister } from '@/lib/parcels/load-parcel-register';
import { parcelInputOf } from '@/lib/parcels/parcel-record';
import { saveParcelEditsAction } from '@/app/(portal)/liaison/[id]/register/actions';
import { createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let liaison: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let schemeId: string;

const uploadsFolder = () => path.join(path.dirname(db.file), 'uploads');
const storedFiles = () => {
  try {
    return readdirSync(uploadsFolder()).length;
  } catch {
    return 0;
  }
};
const upload = (route: 'csv' | 'csv-preview', body: string | Buffer, fileName = 'parcels.csv') =>
  callRoute(`parcels/[id]/${route}`, 'POST', { id: schemeId, body: typeof body === 'string' ? body : new Uint8Array(body), headers: { 'content-type': 'text/csv', 'x-file-name': encodeURIComponent(fileName) } });

const BAD_CSV = [
  'parcel_reference,owner_name,postal_address,email,distance_from_m,distance_to_m,bank_side,ground_level_m,land_use',
  'HM-01,Harrowfield Mill Trust,"Mill House,\nMill Lane, Harrowfield",trustees@harrowfield-mill.test,20,160,right,34.10,mill yard',
  'HM-02,Edith Lowther,"Weir Meadow Farm",not-an-email,160,abc,left,34.05,pasture',
  'HM-03,,"Unit 4",office@osiers.test,900,720,upstream,,coppice',
  'HM-01,Duplicate Owner,"Somewhere",dup@owner.test,1000,1100,left,,',
].join('\n');

beforeAll(async () => {
  db = await useTestDatabase();
  liaison = (await createTestUser('liaison')).sessionUser;
  const designer = await createTestUser('designer');
  schemeId = (await createTestScheme(designer.user.id)).id;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

describe('parcels CSV upload', () => {
  it('previews a bad CSV with every problem at its line and column, storing nothing', async () => {
    signedInAs(liaison);
    const before = await tableSnapshot();
    const response = await upload('csv-preview', BAD_CSV);
    expect(response.status).toBe(200);
    const preview = await response.json();
    expect(preview.ok).toBe(false);
    expect(preview.rows.map((r: { line: number }) => r.line)).toEqual([2, 4, 5, 6]);
    const at = (line: number, column: string) => preview.issues.filter((i: { line: number; column: string }) => i.line === line && i.column === column).map((i: { message: string }) => i.message);
    expect(at(4, 'email')[0]).toMatch(/e-mail address/);
    expect(at(4, 'distance_to_m')[0]).toMatch(/number of metres.*found "abc"/);
    expect(at(5, 'owner_name')[0]).toMatch(/is required/);
    expect(at(5, 'distance_to_m')[0]).toMatch(/greater than the distance from \(900 m\)/);
    expect(at(5, 'bank_side')[0]).toMatch(/left, right or both/);
    expect(at(6, 'parcel_reference')[0]).toMatch(/repeats the reference "HM-01" of line 2/);
    expect(await tableSnapshot()).toEqual(before);
    expect(storedFiles()).toBe(0);
  });

  it('refuses to import a bad CSV with the line-numbered problems, and stores nothing at all', async () => {
    signedInAs(liaison);
    const before = await tableSnapshot();
    const response = await upload('csv', BAD_CSV);
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(body.error).toMatch(/problems; nothing was stored/);
    expect(body.issues.some((i: { path: string; message: string }) => i.path === 'line 4, distance_to_m' && i.message.startsWith('Line 4, distance_to_m:'))).toBe(true);
    expect(await tableSnapshot()).toEqual(before);
    expect(storedFiles()).toBe(0);
  });

  it('refuses a header without the required columns, a spreadsheet file and an over-large file, storing nothing', async () => {
    signedInAs(liaison);
    const before = await tableSnapshot();
    const header = await (await upload('csv', 'reference,owner\nHM-01,Someone\n')).json();
    expect(header.issues.map((i: { message: string }) => i.message).join('\n')).toMatch(/column 1 "reference" is not a parcels column/);
    expect((await upload('csv', Buffer.from([0x50, 0x4b, 0x03, 0x04, 1, 2, 3]), 'parcels.xlsx')).status).toBe(422);
    expect((await upload('csv', Buffer.alloc(3 * 1024 * 1024, 0x41))).status).toBe(413);
    expect(await tableSnapshot()).toEqual(before);
    expect(storedFiles()).toBe(0);
  });

  it('imports the demo CSV as register version 1: file under the data directory, parcels, upload row and audit event', async () => {
    signedInAs(liaison);
    const response = await upload('csv', demoParcelsCsv(), 'harrowfield-parcels.csv');
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ version: 1, parcels: 9 });
    expect(storedFiles()).toBe(1);
    const loaded = await loadParcelRegister({ user: liaison, schemeId });
    expect(loaded.register).toMatchObject({ version: 1, isLatest: true });
    expect(loaded.parcels[0]).toMatchObject({ reference: 'HM-01', ownerName: 'Harrowfield Mill Trust', distanceFromM: 20, distanceToM: 160, bankSide: 'right', groundLevelM: 34.1 });
    expect(loaded.parcels.find((p) => p.reference === 'HM-03')).toMatchObject({ groundLevelM: null, email: 'office@wendle-osiers.test' });
    database();
    expect(await AuditEvent.count({ where: { action: 'parcels.register-imported', schemeId } })).toBe(1);
  });
});

describe('editing the register in the table keeps its history', () => {
  it('saves an edit as version 2, leaving version 1 as it was, and the history says what changed', async () => {
    signedInAs(liaison);
    const current = await loadParcelRegister({ user: liaison, schemeId });
    const parcels = current.parcels.map(parcelInputOf).filter((p) => p.reference !== 'HM-09');
    parcels[0] = { ...parcels[0], email: 'new.trustees@harrowfield-mill.test' };
    parcels.push({ reference: 'HM-10', ownerName: 'New Owner', postalAddress: 'Riverside, Harrowfield', email: '', distanceFromM: 4000, distanceToM: 4200, bankSide: 'left', groundLevelM: null, landUse: '' });
    const result = await saveParcelEditsAction({ schemeId, baseRegisterId: current.register!.id, note: 'New owner at HM-01', parcels });
    expect(result).toMatchObject({ ok: true, data: { version: 2, added: ['HM-10'], removed: ['HM-09'], changed: ['HM-01'] } });
    const v1 = await loadParcelRegister({ user: liaison, schemeId, version: 1 });
    expect(v1.parcels.find((p) => p.reference === 'HM-01')?.email).toBe('trustees@harrowfield-mill.test');
    const history = await listRegisterHistory({ user: liaison, schemeId });
    expect(history.map((h) => h.version)).toEqual([2, 1]);
    expect(history[0]).toMatchObject({ note: 'New owner at HM-01', source: 'Edited in the table', parcelCount: 9, changes: { added: ['HM-10'], removed: ['HM-09'], changed: ['HM-01'] } });
    expect(history[1].source).toBe('CSV upload: harrowfield-parcels.csv');
  });

  it('refuses a field error at the field, and an edit from a stale version with 409, storing nothing', async () => {
    signedInAs(liaison);
    const current = await loadParcelRegister({ user: liaison, schemeId });
    const parcels = current.parcels.map(parcelInputOf);
    const before = await tableSnapshot();
    const bad = await saveParcelEditsAction({ schemeId, baseRegisterId: current.register!.id, note: '', parcels: parcels.map((p, i) => (i === 2 ? { ...p, distanceToM: p.distanceFromM - 10 } : p)) });
    expect(bad).toMatchObject({ ok: false, status: 400 });
    if (!bad.ok) expect(bad.issues).toContainEqual({ path: 'parcels[2].distanceToM', message: expect.stringMatching(/greater than the distance from \(\d+ m\)/) });
    const duplicate = await saveParcelEditsAction({ schemeId, baseRegisterId: current.register!.id, note: '', parcels: [...parcels, { ...parcels[0] }] });
    if (!duplicate.ok) expect(duplicate.issues[0]).toMatchObject({ path: `parcels[${parcels.length}].reference`, message: expect.stringMatching(/repeats the reference of row 1/) });
    const v1 = await ParcelRegister.findOne({ where: { schemeId, version: 1 } });
    const stale = await saveParcelEditsAction({ schemeId, baseRegisterId: v1!.id, note: '', parcels: parcels.map((p, i) => (i === 0 ? { ...p, ownerName: 'Someone else' } : p)) });
    expect(stale).toMatchObject({ ok: false, status: 409 });
    expect(await tableSnapshot()).toEqual(before);
    expect(await Parcel.count({ where: { schemeId } })).toBe(18);
  });
});
