import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { METRES_PER_FOOT } from '@/lib/hydraulics/units';
import { Revision, database } from '@/lib/db';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { createTestRevision, createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type Point = { distanceUpstream: number; waterLevel: number };

// The test's own reading of a stored profile: straight lines between its points, nothing beyond its ends.
function levelAt(points: readonly Point[], d: number): number | null {
  if (!points.length || d < points[0].distanceUpstream || d > points[points.length - 1].distanceUpstream) return null;
  const i = points.findIndex((p) => p.distanceUpstream >= d);
  if (points[i].distanceUpstream === d || i === 0) return points[i].waterLevel;
  const a = points[i - 1];
  const b = points[i];
  return a.waterLevel + ((d - a.distanceUpstream) / (b.distanceUpstream - a.distanceUpstream)) * (b.waterLevel - a.waterLevel);
}
const afflux = (withScheme: Point[], without: Point[], d: number) => (levelAt(withScheme, d) ?? (levelAt(without, d) as number)) - (levelAt(without, d) as number);

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let liaison: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let designerId: string;
let checkerId: string;

async function schemeWithParcels(): Promise<string> {
  const schemeId = (await createTestScheme(designerId)).id;
  signedInAs(liaison);
  const response = await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(demoParcelsCsv()), headers: { 'x-file-name': 'harrowfield-parcels.csv' } });
  expect(response.status).toBe(201);
  return schemeId;
}

beforeAll(async () => {
  db = await useTestDatabase();
  liaison = (await createTestUser('liaison')).sessionUser;
  designerId = (await createTestUser('designer')).user.id;
  checkerId = (await createTestUser('checker')).user.id;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

describe('impact per parcel, from the revision’s stored with- and without-scheme profiles', () => {
  it('gives the afflux interpolated at each parcel’s ends and its maximum over the parcel, for every event', async () => {
    const schemeId = await schemeWithParcels();
    const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
    const stored = JSON.parse(revision.resultsJson as string) as CaseResult;
    const table = await computeParcelImpact({ user: liaison, schemeId });
    expect(table.revision).toMatchObject({ id: revision.id, status: 'countersigned', preliminary: false, resultsStored: true });
    expect(table.rows).toHaveLength(9);
    for (const row of table.rows) {
      const to = Math.min(row.parcel.distanceToM, 6000);
      row.events.forEach((e, i) => {
        const w = stored.events[i].profile;
        const wo = stored.events[i].withoutScheme.profile;
        expect(e.event).toBe(stored.events[i].name);
        expect(e.affluxAtFrom).toBeCloseTo(afflux(w, wo, row.parcel.distanceFromM), 9);
        expect(e.affluxAtTo).toBeCloseTo(afflux(w, wo, to), 9);
        let dense = -Infinity;
        for (let d = row.parcel.distanceFromM; d <= to; d += 0.5) dense = Math.max(dense, afflux(w, wo, d));
        // The maximum over the parcel: never below any sampled value, and no higher than the largest value at a profile point inside.
        const atPoints = [row.parcel.distanceFromM, to, ...[...w, ...wo].map((p) => p.distanceUpstream).filter((d) => d > row.parcel.distanceFromM && d < to)].map((d) => afflux(w, wo, d));
        expect(e.maxAfflux).toBeGreaterThanOrEqual(Math.max(0, dense) - 1e-9);
        expect(e.maxAfflux).toBeCloseTo(Math.max(0, ...atPoints), 9);
        expect(afflux(w, wo, e.maxAffluxAt)).toBeCloseTo(e.maxAfflux, 9);
      });
    }
  });

  it('sorts each parcel into affected, not affected, or outside the reach, and measures inundation against its ground level', async () => {
    const schemeId = await schemeWithParcels();
    await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
    const { rows, impactThresholdM } = await computeParcelImpact({ user: liaison, schemeId });
    const byRef = new Map(rows.map((r) => [r.parcel.reference, r]));
    expect(impactThresholdM).toBe(0.01);
    for (const row of rows) {
      for (const e of row.events) {
        const newlyFlooded = e.withScheme && e.withoutScheme ? e.withScheme.inundatedLength - e.withoutScheme.inundatedLength : 0;
        const expected = e.maxAfflux >= impactThresholdM || newlyFlooded > 0.5 ? 'affected' : e.maxAfflux > 0.0005 ? 'below-threshold' : 'not-affected';
        expect(e.category, `${row.parcel.reference} ${e.event}`).toBe(expected);
      }
      const worst = row.events.some((e) => e.category === 'affected') ? 'affected' : row.events.some((e) => e.category === 'below-threshold') ? 'below-threshold' : 'not-affected';
      expect(row.category).toBe(worst);
    }
    expect(byRef.get('HM-01')?.category).toBe('affected');
    expect(byRef.get('HM-09')?.events[0].category).toBe('not-affected');
    // HM-09 runs past the upstream end of the computed reach (6000 m): only its lower part is assessed.
    expect(byRef.get('HM-09')?.events[0].assessed).toEqual({ from: 5200, to: 6000 });
    const weirMeadow = byRef.get('HM-02')!.events[1];
    expect(weirMeadow.floodingJudgedBy).toBe('ground-level');
    expect(weirMeadow.withScheme!.inundatedLength).toBeGreaterThan(weirMeadow.withoutScheme!.inundatedLength);
    expect(weirMeadow.withScheme!.maxDepth).toBeCloseTo(weirMeadow.withScheme!.maxWaterLevel - 34.05, 9);
    expect(byRef.get('HM-03')!.events[1].floodingJudgedBy).toBe('bank-level');
    expect(byRef.get('HM-02')!.strip?.points.length).toBeGreaterThan(10);
  });

  it('evaluates a draft without stored results on the server and marks it preliminary', async () => {
    const schemeId = await schemeWithParcels();
    const draft = await createTestRevision({ schemeId, authorId: designerId, status: 'draft' });
    const table = await computeParcelImpact({ user: liaison, schemeId });
    expect(table.revision).toMatchObject({ id: draft.id, status: 'draft', preliminary: true, resultsStored: false });
    const certified = await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
    const same = await computeParcelImpact({ user: liaison, schemeId, revisionId: certified.id });
    expect(table.rows.map((r) => r.events.map((e) => e.maxAfflux))).toEqual(same.rows.map((r) => r.events.map((e) => e.maxAfflux)));
    database();
    expect((await Revision.findByPk(draft.id))?.resultsJson).toBeNull();
  });

  it('reads a US-customary revision’s profiles in metres, as the parcels are', async () => {
    const schemeId = await schemeWithParcels();
    const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned', caseFile: 'wendle-harrowfield-us-customary.json' });
    const stored = JSON.parse(revision.resultsJson as string) as CaseResult;
    expect(stored.units).toBe('US');
    const inMetres = (points: Point[]) => points.map((p) => ({ distanceUpstream: p.distanceUpstream * METRES_PER_FOOT, waterLevel: p.waterLevel * METRES_PER_FOOT }));
    const { rows } = await computeParcelImpact({ user: liaison, schemeId, revisionId: revision.id });
    const first = rows[0];
    const w = inMetres(stored.events[0].profile);
    const wo = inMetres(stored.events[0].withoutScheme.profile);
    expect(first.events[0].affluxAtFrom).toBeCloseTo(afflux(w, wo, first.parcel.distanceFromM), 9);
  });

  it('answers the same table over the JSON API, and 404 for a revision of another scheme', async () => {
    const schemeId = await schemeWithParcels();
    const other = await createTestScheme(designerId);
    const foreign = await createTestRevision({ schemeId: other.id, authorId: designerId, checkerId, status: 'countersigned' });
    await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
    signedInAs(liaison);
    const ok = await callRoute('parcels/[id]/impact', 'GET', { id: schemeId });
    expect(ok.status).toBe(200);
    expect((await ok.json()).rows).toHaveLength(9);
    expect((await callRoute('parcels/[id]/impact', 'GET', { id: schemeId, query: `revision=${foreign.id}` })).status).toBe(404);
  });
});
