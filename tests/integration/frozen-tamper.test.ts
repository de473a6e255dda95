import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { countersignRevisionAction } from '@/app/(portal)/checks/[id]/actions';
import { Certificate, Revision } from '@/lib/db';
import { loadCheckView } from '@/lib/review/load-check-view';
import { loadRevisionView } from '@/lib/review/load-revision-view';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { loadWizard } from '@/lib/schemes/load-wizard';
import { behindTheTriggers, revisionTriggers } from './support/behind-the-triggers';
import { createTestScheme } from './support/scheme-factory';
import { createReturnedScheme, revisionRow } from './support/returned-revision';
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

async function tamper(revisionId: string, sql: string): Promise<void> {
  await behindTheTriggers(sql, [revisionId]);
  expect(await revisionTriggers()).toEqual(['revisions_frozen_fields', 'revisions_frozen_no_delete', 'revisions_frozen_status']);
}

describe('a frozen revision altered behind the portal’s back', () => {
  it('is sound before it is altered: no alarm on the revision page, the check page or the wizard', async () => {
    const { scheme, revision } = await createReturnedScheme({ designer, checker });
    expect((await loadRevisionView({ revisionId: revision.id, user: designer.sessionUser })).integrity).toEqual({ inputsIntact: true, resultsIntact: true, revisionIntact: true, problems: [] });
    expect((await loadCheckView({ revisionId: revision.id, checker: checker.sessionUser })).integrity?.problems).toEqual([]);
    expect((await loadWizard({ schemeId: scheme.id, user: designer.sessionUser })).integrity?.problems).toEqual([]);
  });

  it('shows the alarm on every view of a returned revision whose inputs were changed', async () => {
    const { scheme, revision } = await createReturnedScheme({ designer, checker });
    await tamper(revision.id, `UPDATE revisions SET inputs_json = json_set(inputs_json, '$.control.crestLength', 12) WHERE id = ?`);
    const page = await loadRevisionView({ revisionId: revision.id, user: designer.sessionUser });
    expect(page.integrity).toMatchObject({ inputsIntact: false, resultsIntact: true, revisionIntact: true });
    expect(page.integrity?.problems).toEqual([expect.stringMatching(/inputs changed after submission/)]);
    expect((await loadCheckView({ revisionId: revision.id, checker: checker.sessionUser })).integrity?.inputsIntact).toBe(false);
    expect((await loadWizard({ schemeId: scheme.id, user: designer.sessionUser })).integrity?.inputsIntact).toBe(false);
  });

  it('cannot be countersigned when its stored results were changed, and nothing is stored by the attempt', async () => {
    const { revision } = await createTestScheme(designer.user.id);
    await submitForCheck({ revisionId: revision.id, checkerId: checker.user.id, designer: designer.sessionUser, baseUrl: 'http://localhost:3000' });
    await tamper(revision.id, `UPDATE revisions SET results_json = json_set(results_json, '$.verdict', CASE json_extract(results_json, '$.verdict') WHEN 'pass' THEN 'fail' ELSE 'pass' END) WHERE id = ?`);

    const view = await loadCheckView({ revisionId: revision.id, checker: checker.sessionUser });
    expect(view.integrity).toMatchObject({ inputsIntact: true, resultsIntact: false });
    expect(view.check?.blockers).toEqual(expect.arrayContaining([expect.stringMatching(/stored results changed after submission/)]));

    signedInAs(checker.sessionUser);
    const before = await tableSnapshot();
    const row = await revisionRow(revision.id);
    const refused = await countersignRevisionAction({ revisionId: revision.id, password: checker.password, confirmed: true });
    expect(refused).toMatchObject({ ok: false, status: 409, error: expect.stringMatching(/Countersigning is blocked.*stored results changed/) });
    expect(await tableSnapshot()).toEqual(before);
    expect(await revisionRow(revision.id)).toEqual(row);
    expect(await Certificate.count({ where: { revisionId: revision.id } })).toBe(0);
    expect((await Revision.findByPk(revision.id))!.status).toBe('submitted');
  });
});
