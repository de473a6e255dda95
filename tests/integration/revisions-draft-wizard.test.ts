import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Revision, database } from '@/lib/db';
import { CHANNEL_STEP, SCHEME_STEP, STRUCTURE_STEP, callRoute, completedDraft } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let otherDesigner: typeof designer;
let checker: typeof designer;

beforeAll(async () => {
  db = await useTestDatabase();
  designer = (await createTestUser('designer')).sessionUser;
  otherDesigner = (await createTestUser('designer')).sessionUser;
  checker = (await createTestUser('checker')).sessionUser;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

describe('the wizard saves each step into a draft revision', () => {
  it('creates a scheme with its first draft and restores every saved step', async () => {
    signedInAs(designer);
    const { schemeId, revisionId } = await completedDraft();
    const loaded = await callRoute('revisions/[id]', 'GET', { id: revisionId });
    expect(loaded.status).toBe(200);
    const body = await loaded.json();
    expect(body.revision).toMatchObject({ number: 1, status: 'draft', wizardStep: 'results', editable: true });
    expect(body.inputs.reach).toMatchObject({ kind: 'prismatic', ...CHANNEL_STEP, bedLevelAtControl: 31.2, length: 6000, bankHeight: 3.2 });
    expect(body.inputs.control).toMatchObject(STRUCTURE_STEP.control);
    expect(body.inputs.wizard).toMatchObject({ datum: SCHEME_STEP.datum, governing: 1 });
    const scheme = await (await callRoute('schemes/[id]', 'GET', { id: schemeId })).json();
    expect(scheme.scheme.reference).toMatch(/^SM-\d{4}$/);
    const history = scheme.revisions[0].entries.map((e: { summary: string }) => e.summary);
    expect(history[0]).toContain('Draft started (new scheme)');
    expect(history.some((s: string) => s.includes('Saved the structure') && s.includes('proposed structure: sill height above the bed'))).toBe(true);
  });

  it('refuses a limit beyond the reach on the limits step, naming the limit and both distances, and stores nothing', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const before = await tableSnapshot();
    const limits = [{ label: 'Far pasture gate', distanceUpstream: 7500, maxLevel: 40, freeboard: 0 }];
    const response = await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'limits', values: { impactThreshold: 0.01, limits } } });
    expect(response.status).toBe(400);
    const { issues } = (await response.json()) as { issues: { path: string; message: string }[] };
    expect(issues).toEqual([{ path: 'limits[0].distanceUpstream', message: expect.stringMatching(/"Far pasture gate" is 7500 m upstream, beyond the upstream end of the reach \(6000 m from the structure\)/) }]);
    expect(await tableSnapshot()).toEqual(before);
  });

  it('refuses bad values with the field path and the unit, and stores nothing', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const before = await tableSnapshot();
    const stored = (await Revision.findByPk(revisionId))!.inputsJson;
    const response = await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'channel', values: { section: { shape: 'rectangular', width: -3 }, manningN: 0.9, bedSlope: 'steep' } } });
    expect(response.status).toBe(400);
    const { issues } = (await response.json()) as { issues: { path: string; message: string }[] };
    expect(issues).toEqual(
      expect.arrayContaining([
        { path: 'section.width', label: 'channel: width', message: 'must be greater than 0 m' },
        { path: 'manningN', label: "channel: Manning's n", message: expect.stringContaining('at most 0.5') },
        { path: 'bedSlope', label: 'channel: bed slope', message: expect.stringContaining('must be a number (m/m') },
      ]),
    );
    expect(await tableSnapshot()).toEqual(before);
    expect((await Revision.findByPk(revisionId))!.inputsJson).toBe(stored);
  });

  it('shows the head over the crest and the control depth from the structure form’s unsaved values', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const before = await tableSnapshot();
    const preview = async (sillHeight: number) => (await callRoute('head-preview', 'POST', { json: { revisionId, control: { ...STRUCTURE_STEP.control, sillHeight } } })).json();
    const low = await preview(1.0);
    const high = await preview(1.6);
    expect(low.events).toHaveLength(2);
    expect(low.events[0].head).toBeGreaterThan(0);
    expect(high.events[0].controlDepth).toBeGreaterThan(low.events[0].controlDepth);
    expect(low.events[0].weir.coefficientSource).toMatch(/\w/);
    const bad = await callRoute('head-preview', 'POST', { json: { revisionId, control: { ...STRUCTURE_STEP.control, crestLength: 0 } } });
    expect(bad.status).toBe(400);
    expect((await bad.json()).issues).toContainEqual({ path: 'control.crestLength', message: 'Proposed structure: crest length must be greater than 0 m' });
    expect(await tableSnapshot()).toEqual(before);
  });

  it('evaluates the draft, stores the result once, and adopts the sized crest', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const evaluated = await callRoute('evaluate', 'POST', { json: { revisionId } });
    expect(evaluated.status).toBe(200);
    const { result } = await evaluated.json();
    expect(['pass', 'fail']).toContain(result.verdict);
    expect(result.events[1].limits).toHaveLength(2);
    expect(result.sizing.value).toBeGreaterThan(0);
    expect((await Revision.findByPk(revisionId))!.resultsJson).not.toBeNull();

    const { adoptSizedCrest } = await import('@/lib/revisions/adopt-sized-crest');
    const adopted = await adoptSizedCrest({ revisionId, user: designer });
    expect(adopted.to).toBe(result.sizing.value);
    const revision = (await Revision.findByPk(revisionId))!;
    expect(JSON.parse(revision.inputsJson).control.sillHeight).toBe(result.sizing.value);
    expect(revision.resultsJson).toBeNull();
    expect(await AuditEvent.count({ where: { action: 'revision.crest-adopted', entityId: revisionId } })).toBe(1);
  });

  it('stores one result when two views evaluate the same draft at once', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const responses = await Promise.all([callRoute('evaluate', 'POST', { json: { revisionId } }), callRoute('evaluate', 'POST', { json: { revisionId } })]);
    expect(responses.map((r) => r.status)).toEqual([200, 200]);
    expect(await AuditEvent.count({ where: { action: 'revision.evaluated', entityId: revisionId } })).toBe(1);
  });

  it('tells the designer which steps are missing before a draft can be evaluated', async () => {
    signedInAs(designer);
    const created = await (await callRoute('schemes', 'POST', { json: SCHEME_STEP })).json();
    const response = await callRoute('evaluate', 'POST', { json: { revisionId: created.revisionId } });
    expect(response.status).toBe(422);
    const { issues } = (await response.json()) as { issues: { path: string; step: string }[] };
    expect(issues).toEqual(expect.arrayContaining([expect.objectContaining({ path: 'reach.section', step: 'channel' }), expect.objectContaining({ path: 'events', step: 'flows' }), expect.objectContaining({ path: 'control', step: 'structure' })]));
  });
});

describe('ownership and frozen revisions', () => {
  it('hides one designer’s drafts from another (404) and lets a checker read but not save', async () => {
    signedInAs(designer);
    const { schemeId, revisionId } = await completedDraft();
    signedInAs(otherDesigner);
    expect((await callRoute('revisions/[id]', 'GET', { id: revisionId })).status).toBe(404);
    expect((await callRoute('schemes/[id]', 'GET', { id: schemeId })).status).toBe(404);
    expect((await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'channel', values: CHANNEL_STEP } })).status).toBe(404);
    expect((await callRoute('head-preview', 'POST', { json: { revisionId, control: STRUCTURE_STEP.control } })).status).toBe(404);
    signedInAs(checker);
    const read = await (await callRoute('revisions/[id]', 'GET', { id: revisionId })).json();
    expect(read.revision.editable).toBe(false);
    expect((await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'channel', values: CHANNEL_STEP } })).status).toBe(403);
  });

  it('refuses to save a submitted revision (409) and starts a new draft from it', async () => {
    signedInAs(designer);
    const { schemeId, revisionId } = await completedDraft();
    database();
    await Revision.update({ status: 'submitted', submittedAt: new Date().toISOString() }, { where: { id: revisionId } });
    const before = await tableSnapshot();
    const refused = await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'channel', values: CHANNEL_STEP } });
    expect(refused.status).toBe(409);
    expect((await refused.json()).error).toMatch(/read-only.*new draft/);
    expect(await tableSnapshot()).toEqual(before);

    const { startDraftFromRevision } = await import('@/lib/revisions/start-draft-from-revision');
    const draft = await startDraftFromRevision({ revisionId, user: designer });
    expect(draft.revisionNumber).toBe(2);
    const copy = (await Revision.findByPk(draft.revisionId))!;
    expect(copy.basedOnRevisionId).toBe(revisionId);
    expect(JSON.parse(copy.inputsJson).control).toEqual(JSON.parse((await Revision.findByPk(revisionId))!.inputsJson).control);
    await expect(startDraftFromRevision({ revisionId, user: designer })).rejects.toThrow(/already a draft/);
    const scheme = await (await callRoute('schemes/[id]', 'GET', { id: schemeId })).json();
    expect(scheme.revisions.map((r: { number: number; status: string }) => [r.number, r.status])).toEqual([[2, 'draft'], [1, 'submitted']]);
  });

  it('will not change units once numbers have been entered', async () => {
    signedInAs(designer);
    const { revisionId } = await completedDraft();
    const response = await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step: 'scheme', values: { ...SCHEME_STEP, units: 'US' } } });
    expect(response.status).toBe(400);
    expect((await response.json()).issues[0]).toMatchObject({ path: 'units', message: expect.stringContaining('cannot change') });
  });
});
