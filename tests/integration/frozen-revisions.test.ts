import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adoptSizedCrestAction, startDraftAction } from '@/app/(portal)/schemes/[id]/actions';
import { submitForCheckAction } from '@/app/(portal)/revisions/[id]/actions';
import { Revision, database } from '@/lib/db';
import { loadScheme } from '@/lib/schemes/load-scheme';
import { loadWizard } from '@/lib/schemes/load-wizard';
import { CHANNEL_STEP, STRUCTURE_STEP, callRoute } from './support/scheme-requests';
import { RETURN_SUMMARY, STRUCTURE_COMMENT, createReturnedScheme, revisionRow } from './support/returned-revision';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Person;
let checker: Person;

beforeAll(async () => {
  db = await useTestDatabase();
  designer = await createTestUser('designer');
  checker = await createTestUser('checker');
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const SURVEY = new TextEncoder().encode('section,chainage,offset,level,manningN\nA,0,0,33,0.035\nA,0,5,31,0.035\nA,0,10,33,0.035\nB,500,0,33.3,0.035\nB,500,5,31.3,0.035\nB,500,10,33.3,0.035\n');

describe('a returned revision stays frozen', () => {
  it('is refused by the wizard’s API, its upload, its preview and every action that would change it (409, nothing stored)', async () => {
    const { revision } = await createReturnedScheme({ designer, checker });
    signedInAs(designer.sessionUser);
    const rowBefore = await revisionRow(revision.id);
    const before = await tableSnapshot();

    const saved = await callRoute('revisions/[id]', 'PUT', { id: revision.id, json: { step: 'channel', values: CHANNEL_STEP } });
    expect(saved.status).toBe(409);
    expect((await saved.json()).error).toMatch(/Revision 1 was returned by the checker and stays frozen.*Start a new draft from revision 1/);
    const structure = await callRoute('revisions/[id]', 'PUT', { id: revision.id, json: { step: 'structure', values: { control: { ...STRUCTURE_STEP.control, crestLength: 12 } } } });
    expect(structure.status).toBe(409);
    const survey = await callRoute('uploads/survey', 'POST', { query: `revision=${revision.id}`, body: SURVEY, headers: { 'content-type': 'text/csv', 'x-file-name': 'survey.csv' } });
    expect(survey.status).toBe(409);
    const preview = await callRoute('head-preview', 'POST', { json: { revisionId: revision.id, control: STRUCTURE_STEP.control } });
    expect(preview.status).toBe(409);
    const adopted = await adoptSizedCrestAction({ revisionId: revision.id });
    expect(adopted).toMatchObject({ ok: false, status: 409 });
    const resubmitted = await submitForCheckAction({ revisionId: revision.id, checkerId: checker.user.id });
    expect(resubmitted).toMatchObject({ ok: false, status: 409, error: expect.stringMatching(/returned; only a draft can be submitted/) });
    const evaluated = await callRoute('evaluate', 'POST', { json: { revisionId: revision.id } });
    expect(evaluated.status).toBeLessThan(500);

    expect(await tableSnapshot()).toEqual(before);
    expect(await revisionRow(revision.id)).toEqual(rowBefore);
  });

  it('offers a new draft from it, which carries the checker’s comments; the scheme’s main action follows the open draft', async () => {
    const { scheme, revision } = await createReturnedScheme({ designer, checker });
    signedInAs(designer.sessionUser);
    const returned = await loadScheme({ schemeId: scheme.id, user: designer.sessionUser });
    expect(returned.openDraft).toBeNull();
    const readOnly = await loadWizard({ schemeId: scheme.id, user: designer.sessionUser });
    expect(readOnly).toMatchObject({ editable: false, carried: null, revision: { id: revision.id, status: 'returned' } });
    expect(readOnly.integrity?.problems).toEqual([]);

    const started = await startDraftAction({ revisionId: revision.id });
    if (!started.ok) throw new Error(started.error);
    expect(started.data.revisionNumber).toBe(2);
    const draft = (await Revision.findByPk(started.data.revisionId))!;
    expect(draft).toMatchObject({ status: 'draft', basedOnRevisionId: revision.id, resultsJson: null, inputsSha256: null });

    const wizard = await loadWizard({ schemeId: scheme.id, user: designer.sessionUser });
    expect(wizard).toMatchObject({ editable: true, integrity: null, revision: { id: draft.id } });
    expect(wizard.carried).toMatchObject({ fromRevision: { id: revision.id, number: 1 }, summaries: [{ summary: RETURN_SUMMARY }], comments: [{ part: 'structure', body: STRUCTURE_COMMENT }] });
    expect((await loadScheme({ schemeId: scheme.id, user: designer.sessionUser })).openDraft).toMatchObject({ id: draft.id, number: 2 });

    const saved = await callRoute('revisions/[id]', 'PUT', { id: draft.id, json: { step: 'structure', values: { control: { ...STRUCTURE_STEP.control, crestLength: 12 } } } });
    expect(saved.status).toBe(200);
    expect(JSON.parse((await Revision.findByPk(revision.id))!.inputsJson).control.crestLength).toBe(10);
  });
});

/** SQLite's own message for a refused statement (Sequelize reports a trigger's abort as a bare "Validation error"). */
async function sqliteRefusal(sql: string, id: string): Promise<string> {
  try {
    await database().query(sql, { replacements: [id] });
  } catch (error) {
    const original = (error as { original?: Error }).original;
    return original?.message ?? String(error);
  }
  return 'the statement was not refused';
}

describe('the database itself refuses to change a frozen revision', () => {
  const frozenUpdates: [string, string][] = [
    ['inputs', `UPDATE revisions SET inputs_json = json_set(inputs_json, '$.control.crestLength', 14) WHERE id = ?`],
    ['results', `UPDATE revisions SET results_json = '{}' WHERE id = ?`],
    ['inputs hash', `UPDATE revisions SET inputs_sha256 = 'x' WHERE id = ?`],
    ['results hash', `UPDATE revisions SET results_sha256 = 'x' WHERE id = ?`],
    ['revision hash', `UPDATE revisions SET revision_sha256 = 'x' WHERE id = ?`],
    ['engine version', `UPDATE revisions SET engine_version = '0.0.0' WHERE id = ?`],
    ['status back to draft', `UPDATE revisions SET status = 'draft' WHERE id = ?`],
    ['row', `DELETE FROM revisions WHERE id = ?`],
  ];

  for (const status of ['submitted', 'returned', 'countersigned', 'withdrawn'] as const) {
    it(`aborts every UPDATE of the frozen fields, and the DELETE, of a ${status} revision`, async () => {
      const { revision } = await createReturnedScheme({ designer, checker });
      const sequelize = database();
      if (status !== 'returned') await sequelize.query('UPDATE revisions SET status = ?, countersigned_at = ? WHERE id = ?', { replacements: [status, status === 'countersigned' ? new Date().toISOString() : null, revision.id] });
      const before = await revisionRow(revision.id);
      for (const [what, sql] of frozenUpdates) {
        expect(await sqliteRefusal(sql, revision.id), what).toMatch(/SQLITE_CONSTRAINT.*(frozen|cannot become a draft)/);
      }
      expect(await revisionRow(revision.id)).toEqual(before);
    });
  }

  it('still lets a draft change and be deleted', async () => {
    const { revision } = await createReturnedScheme({ designer, checker });
    signedInAs(designer.sessionUser);
    const started = await startDraftAction({ revisionId: revision.id });
    if (!started.ok) throw new Error(started.error);
    const sequelize = database();
    await sequelize.query(`UPDATE revisions SET inputs_json = json_set(inputs_json, '$.control.crestLength', 14), engine_version = NULL WHERE id = ?`, { replacements: [started.data.revisionId] });
    expect(JSON.parse((await Revision.findByPk(started.data.revisionId))!.inputsJson).control.crestLength).toBe(14);
    await sequelize.query('DELETE FROM revisions WHERE id = ?', { replacements: [started.data.revisionId] });
    expect(await Revision.findByPk(started.data.revisionId)).toBeNull();
  });
});
