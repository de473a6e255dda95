import { execFileSync } from 'node:child_process';
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Letter, Parcel, ParcelPlan, database } from '@/lib/db';
import { listRegisterHistory } from '@/lib/parcels/list-register-history';
import { loadParcelRegister } from '@/lib/parcels/load-parcel-register';
import { parcelInputOf } from '@/lib/parcels/parcel-record';
import { loadParcelPlan } from '@/lib/plan/load-parcel-plan';
import { parcelPlanView } from '@/lib/plan/parcel-plan-view';
import { generateLettersAction } from '@/app/(portal)/liaison/[id]/letters/actions';
import { saveParcelEditsAction } from '@/app/(portal)/liaison/[id]/register/actions';
import { restoreRegisterVersionAction } from '@/app/(portal)/liaison/[id]/register/history/actions';
import { createTestRevision, createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let liaison: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let schemeId: string;
let revisionId: string;

const DEMO_PLAN = readFileSync(path.resolve('db', 'seeds', 'parcels', 'harrowfield-plan.geojson'), 'utf8');
const planFiles = () => {
  try {
    return readdirSync(path.join(path.dirname(db.file), 'plans')).length;
  } catch {
    return 0;
  }
};
const uploadPlan = (body: string, { type = 'application/geo+json', system = 'Harrowfield site grid' }: { type?: string; system?: string } = {}) =>
  callRoute('parcels/[id]/plan', 'POST', { id: schemeId, body, headers: { 'content-type': type, 'x-file-name': 'harrowfield-plan.geojson', 'x-coordinate-system': encodeURIComponent(system) } });

beforeAll(async () => {
  db = await useTestDatabase();
  const designer = await createTestUser('designer');
  liaison = (await createTestUser('liaison')).sessionUser;
  schemeId = (await createTestScheme(designer.user.id)).id;
  revisionId = (await createTestRevision({ schemeId, authorId: designer.user.id, status: 'draft', storeResults: true })).id;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

describe('uploading the plan of the parcels', () => {
  it('refuses a plan before there is a register to match it to, storing nothing', async () => {
    signedInAs(liaison);
    const before = await tableSnapshot();
    const response = await uploadPlan(DEMO_PLAN);
    expect(response.status).toBe(422);
    expect((await response.json()).error).toMatch(/Upload the parcels register first/);
    expect(await tableSnapshot()).toEqual(before);
    expect(planFiles()).toBe(0);
  });

  it('refuses an outline of a parcel not in the register by its feature number, and a missing coordinate system by name', async () => {
    signedInAs(liaison);
    const csv = await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(demoParcelsCsv()), headers: { 'x-file-name': 'harrowfield-parcels.csv' } });
    expect(csv.status).toBe(201);
    const before = await tableSnapshot();
    const plan = JSON.parse(DEMO_PLAN);
    plan.features[4].properties.parcel_reference = 'HM-99';
    const unknown = await uploadPlan(JSON.stringify(plan));
    expect(unknown.status).toBe(400);
    const body = await unknown.json();
    expect(body.issues).toEqual([{ path: 'feature 5, parcel reference', message: 'Feature 5, parcel reference: HM-99 is not a parcel of the register (version 1): correct the reference or add the parcel to the register first' }]);
    const noSystem = await uploadPlan(DEMO_PLAN, { system: '' });
    expect(noSystem.status).toBe(400);
    expect((await noSystem.json()).issues[0]).toMatchObject({ path: 'coordinateSystem', label: 'Coordinate system', message: expect.stringMatching(/^is required \(the projected coordinate system/) });
    expect((await uploadPlan(DEMO_PLAN, { type: 'image/png' })).status).toBe(400);
    expect(await tableSnapshot()).toEqual(before);
    expect(planFiles()).toBe(0);
  });

  it('stores the demo plan as version 1, its file beside the database, with an audit event, and lays it out with categories', async () => {
    signedInAs(liaison);
    const response = await uploadPlan(DEMO_PLAN);
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ version: 1, outlines: 9, withoutOutline: [] });
    expect(planFiles()).toBe(1);
    const stored = await loadParcelPlan(schemeId);
    expect(stored).toMatchObject({ version: 1, coordinateSystem: 'Harrowfield site grid', sourceFormat: 'geojson' });
    database();
    expect(await AuditEvent.count({ where: { action: 'parcels.plan-imported', schemeId } })).toBe(1);
    const view = await parcelPlanView({ user: liaison, schemeId, width: 960 });
    expect(view.parcels.map((p) => p.reference)).toEqual(['HM-01', 'HM-02', 'HM-03', 'HM-04', 'HM-05', 'HM-06', 'HM-07', 'HM-08', 'HM-09']);
    expect(view.parcels.every((p) => p.inRegister && p.category !== 'not-computed')).toBe(true);
    expect(view.drawing?.parcels.every((p) => p.path.startsWith('M'))).toBe(true);
    // The demo outlines were drawn along the register's frontages (160 to 720 m), so linear referencing gives them
    // back, to within what the bends do to the far side of an outline 218 m deep.
    const hm02 = view.parcels.find((p) => p.reference === 'HM-02')!.outlineChainage!;
    expect(Math.abs(hm02.from - 160)).toBeLessThan(15);
    expect(Math.abs(hm02.to - 720)).toBeLessThan(15);
  });

  it('takes a CSV of vertices as the next version', async () => {
    signedInAs(liaison);
    const csv = ['feature,easting_m,northing_m', 'centreline,441250,287400', 'centreline,441250,288400', 'HM-01,441260,287420', 'HM-01,441300,287420', 'HM-01,441300,287560', 'HM-01,441260,287560'].join('\n');
    const response = await uploadPlan(csv, { type: 'text/csv' });
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ version: 2, outlines: 1, withoutOutline: ['HM-02', 'HM-03', 'HM-04', 'HM-05', 'HM-06', 'HM-07', 'HM-08', 'HM-09'] });
    expect(await ParcelPlan.count({ where: { schemeId } })).toBe(2);
  });
});

describe('restoring an earlier version of the register', () => {
  it('saves version 1’s parcels as version 3 after an edit, and the history names the fields each version changed', async () => {
    signedInAs(liaison);
    const current = await loadParcelRegister({ user: liaison, schemeId });
    const parcels = current.parcels.map(parcelInputOf).map((p) => (p.reference === 'HM-04' ? { ...p, ownerName: 'Ruth Kestle', postalAddress: 'Long Holm, Harrowfield' } : p));
    const edited = await saveParcelEditsAction({ schemeId, baseRegisterId: current.register!.id, note: 'New owner at HM-04', parcels });
    expect(edited).toMatchObject({ ok: true, data: { version: 2 } });
    const latest = await loadParcelRegister({ user: liaison, schemeId });
    const restored = await restoreRegisterVersionAction({ schemeId, baseRegisterId: latest.register!.id, version: 1, note: '' });
    expect(restored).toMatchObject({ ok: true, data: { version: 3, restoredVersion: 1, changed: ['HM-04'] } });
    const v3 = await loadParcelRegister({ user: liaison, schemeId });
    expect(v3.parcels.find((p) => p.reference === 'HM-04')?.ownerName).toBe('Barnaby and Ruth Kestle');
    const history = await listRegisterHistory({ user: liaison, schemeId });
    expect(history.map((h) => [h.version, h.source, h.isLatest])).toEqual([[3, 'Restored from version 1', true], [2, 'Edited in the table', false], [1, 'CSV upload: harrowfield-parcels.csv', false]]);
    expect(history[1].fieldChanges).toEqual([{ reference: 'HM-04', fields: ['owner or occupier', 'postal address'] }]);
    expect(history[0].fieldChanges).toEqual([{ reference: 'HM-04', fields: ['owner or occupier', 'postal address'] }]);
    database();
    expect(await AuditEvent.count({ where: { action: 'parcels.register-restored', schemeId } })).toBe(1);
  });

  it('refuses a stale base (409), the current version (422) and a version that does not exist (404), storing nothing', async () => {
    signedInAs(liaison);
    const before = await tableSnapshot();
    const history = await listRegisterHistory({ user: liaison, schemeId });
    const stale = await restoreRegisterVersionAction({ schemeId, baseRegisterId: history[1].id, version: 1, note: '' });
    expect(stale).toMatchObject({ ok: false, status: 409 });
    const same = await restoreRegisterVersionAction({ schemeId, baseRegisterId: history[0].id, version: 3, note: '' });
    expect(same).toMatchObject({ ok: false, status: 422 });
    const missing = await restoreRegisterVersionAction({ schemeId, baseRegisterId: history[0].id, version: 9, note: '' });
    expect(missing).toMatchObject({ ok: false, status: 404 });
    const unchanged = await restoreRegisterVersionAction({ schemeId, baseRegisterId: history[0].id, version: 1, note: '' });
    expect(unchanged).toMatchObject({ ok: false, status: 422 });
    expect(await tableSnapshot()).toEqual(before);
  });
});

describe('the plan in the letters', () => {
  it('puts the plan cropped round the parcel in the letter of a parcel with an outline, and none in the others', async () => {
    signedInAs(liaison);
    // Plan version 2 (the CSV above) outlines HM-01 only.
    const made = await generateLettersAction({ schemeId, revisionId });
    expect(made.ok).toBe(true);
    database();
    const letters = await Letter.findAll({ where: { revisionId } });
    const references = new Map((await Parcel.findAll({ where: { id: letters.map((l) => l.parcelId) } })).map((p) => [p.id, p.reference]));
    const text = (pdfPath: string | null) => execFileSync('pdftotext', [pdfPath!, '-']).toString();
    const withOutline = letters.find((l) => references.get(l.parcelId) === 'HM-01');
    const without = letters.find((l) => references.get(l.parcelId) !== 'HM-01');
    expect(withOutline && without).toBeTruthy();
    expect(text(withOutline!.pdfPath)).toContain('Plan: where your land (HM-01) lies');
    expect(text(without!.pdfPath)).not.toContain('Plan: where your land');
  });
});
