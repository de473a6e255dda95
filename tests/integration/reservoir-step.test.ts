import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Revision } from '@/lib/db';
import { FLOWS_STEP, RESERVOIR_STEP, callRoute, completedDraft } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
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

const saveStep = (revisionId: string, step: string, values: unknown) => callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step, values } });
const inputsOf = async (revisionId: string) => JSON.parse((await Revision.findByPk(revisionId))!.inputsJson) as Record<string, unknown> & { events: { name: string; hydrograph?: unknown }[] };

describe('the reservoir and inflow step', () => {
  it('stores the storage and each event’s hydrograph in the case file, and the flows step keeps them', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const saved = await saveStep(revisionId, 'reservoir', RESERVOIR_STEP);
    expect(saved.status).toBe(200);
    expect(await saved.json()).toMatchObject({ step: 'reservoir', nextStep: 'limits' });
    let inputs = await inputsOf(revisionId);
    expect(inputs.reservoir).toEqual(RESERVOIR_STEP.reservoir);
    expect(inputs.events[0].hydrograph).toEqual(RESERVOIR_STEP.hydrographs[0]);
    expect(inputs.events[1].hydrograph).toBeUndefined();

    expect((await saveStep(revisionId, 'flows', FLOWS_STEP)).status).toBe(200);
    inputs = await inputsOf(revisionId);
    expect(inputs.events[0].hydrograph).toEqual(RESERVOIR_STEP.hydrographs[0]);

    // Turning the reservoir off removes the storage and every hydrograph.
    expect((await saveStep(revisionId, 'reservoir', { hydrographs: [null, null] })).status).toBe(200);
    inputs = await inputsOf(revisionId);
    expect(inputs.reservoir).toBeUndefined();
    expect(inputs.events.map((e) => e.hydrograph)).toEqual([undefined, undefined]);
  });

  it('refuses, naming the field in words and storing nothing: a hydrograph without storage, a count unlike the events, a time running back', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const before = (await Revision.findByPk(revisionId))!.inputsJson;
    const cases: [unknown, string, RegExp][] = [
      [{ hydrographs: RESERVOIR_STEP.hydrographs }, 'reservoir', /is required to route an inflow hydrograph/],
      [{ ...RESERVOIR_STEP, hydrographs: [RESERVOIR_STEP.hydrographs[0]] }, 'hydrographs', /one inflow \(or none\) for each of the 2 design events/],
      [{ ...RESERVOIR_STEP, hydrographs: [{ kind: 'table', points: [{ time: 0, discharge: 3 }, { time: 4, discharge: 9 }, { time: 2, discharge: 5 }] }, null] }, 'hydrographs[0].points[2].time', /later than the time of the point before it/],
    ];
    for (const [values, path, message] of cases) {
      const response = await saveStep(revisionId, 'reservoir', values);
      expect(response.status, path).toBe(400);
      const issues = ((await response.json()) as { issues: { path: string; label?: string; message: string }[] }).issues;
      expect(issues, path).toContainEqual(expect.objectContaining({ path, message: expect.stringMatching(message) }));
      expect(issues.every((i) => !i.label || !/\.|\[/.test(i.label)), 'labels are words').toBe(true);
    }
    expect((await Revision.findByPk(revisionId))!.inputsJson).toBe(before);
  });

  it('refuses a reservoir behind a fixed-depth control, saying why', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    expect((await saveStep(revisionId, 'structure', { control: { type: 'depth', depth: 2.4 } })).status).toBe(200);
    const response = await saveStep(revisionId, 'reservoir', RESERVOIR_STEP);
    expect(response.status).toBe(400);
    expect(JSON.stringify(await response.json())).toContain('needs a weir, spillway or rating table');
  });
});
