import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addReviewCommentAction, countersignRevisionAction, returnRevisionAction } from '@/app/(portal)/checks/[id]/actions';
import { submitForCheckAction } from '@/app/(portal)/revisions/[id]/actions';
import { Certificate, Revision, User, database } from '@/lib/db';
import { checkFrozenRevision } from '@/lib/review/check-frozen-revision';
import { resultsSha256, revisionSha256 } from '@/lib/revisions/revision-hashes';
import { behindTheTriggers } from './support/behind-the-triggers';
import { createTestScheme, demoCase } from './support/scheme-factory';
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

async function submittedRevision(checkerId: string | null = checker.user.id) {
  const { scheme, revision } = await createTestScheme(designer.user.id);
  signedInAs(designer.sessionUser);
  const submitted = await submitForCheckAction({ revisionId: revision.id, checkerId: checkerId ?? '' });
  expect(submitted.ok).toBe(true);
  return { scheme, revision: (await Revision.findByPk(revision.id))! };
}

/** Runs the call and proves it changed nothing stored. */
async function refusedWithoutChange<T>(call: () => Promise<T>): Promise<T> {
  const before = await tableSnapshot();
  const result = await call();
  expect(await tableSnapshot()).toEqual(before);
  return result;
}

const sql = (text: string, replacements: Record<string, unknown> = {}) => database().query(text, { replacements }).then(() => 'accepted', (e: { parent?: Error; message: string }) => e.parent?.message ?? e.message);

describe('four-eyes rule', () => {
  it('refuses the revision’s own designer as checker, even after a role change, and stores nothing', async () => {
    const { revision } = await submittedRevision(null);
    await User.update({ role: 'checker' }, { where: { id: designer.user.id } });
    const authorAsChecker = { ...designer.sessionUser, role: 'checker' as const };
    signedInAs(authorAsChecker);
    try {
      const calls: (() => Promise<unknown>)[] = [
        () => addReviewCommentAction({ revisionId: revision.id, part: 'results', body: 'Looks fine to me.' }),
        () => returnRevisionAction({ revisionId: revision.id, summary: 'Returning my own work to myself.' }),
        () => countersignRevisionAction({ revisionId: revision.id, password: designer.password, confirmed: true }),
      ];
      for (const call of calls) {
        expect(await refusedWithoutChange(call)).toMatchObject({ ok: false, status: 403, error: expect.stringMatching(/four-eyes/) });
      }
    } finally {
      await User.update({ role: 'designer' }, { where: { id: designer.user.id } });
    }
  });

  it('refuses the designer as the chosen checker, and the database refuses it too', async () => {
    const { revision } = await createTestScheme(designer.user.id);
    signedInAs(designer.sessionUser);
    const result = await refusedWithoutChange(() => submitForCheckAction({ revisionId: revision.id, checkerId: designer.user.id }));
    expect(result).toMatchObject({ ok: false, status: 400, issues: [{ path: 'checkerId' }] });
    expect(await sql('UPDATE revisions SET checker_id = author_id WHERE id = :id', { id: revision.id })).toMatch(/CHECK constraint/);
  });

  it('refuses a checker when the revision is assigned to another checker', async () => {
    const { revision } = await submittedRevision(checker.user.id);
    signedInAs((await createTestUser('checker')).sessionUser);
    const result = await refusedWithoutChange(() => addReviewCommentAction({ revisionId: revision.id, part: 'flows', body: 'Not my check.' }));
    expect(result).toMatchObject({ ok: false, status: 403 });
  });
});

describe('frozen-revision rule', () => {
  it('the database refuses to change a submitted revision’s inputs or results', async () => {
    const { revision } = await submittedRevision();
    expect(await sql("UPDATE revisions SET inputs_json = '{}' WHERE id = :id", { id: revision.id })).toMatch(/frozen/);
    expect(await sql("UPDATE revisions SET results_sha256 = 'x' WHERE id = :id", { id: revision.id })).toMatch(/frozen/);
    signedInAs(designer.sessionUser);
    expect(await refusedWithoutChange(() => submitForCheckAction({ revisionId: revision.id, checkerId: '' }))).toMatchObject({ ok: false, status: 409 });
  });

  it('blocks countersigning when the inputs changed after submission (here behind the trigger’s back) and stores nothing', async () => {
    const { revision } = await submittedRevision();
    const changed = demoCase(undefined, (c) => ((c.control as { sillHeight: number }).sillHeight = 1.1));
    // Someone with direct access to the file drops the trigger and edits the inputs: the hashes still tell.
    await behindTheTriggers('UPDATE revisions SET inputs_json = :json WHERE id = :id', { json: JSON.stringify(changed), id: revision.id });
    signedInAs(checker.sessionUser);
    const result = await refusedWithoutChange(() => countersignRevisionAction({ revisionId: revision.id, password: checker.password, confirmed: true }));
    expect(result).toMatchObject({ ok: false, status: 409, error: expect.stringMatching(/inputs changed after submission/) });
    expect(await Certificate.count({ where: { revisionId: revision.id } })).toBe(0);
  });

  it('blocks countersigning when the re-run does not reproduce the stored results, and shows each difference', async () => {
    const { revision } = await submittedRevision();
    const stored = JSON.parse(revision.resultsJson!);
    stored.events[0].control.head += 0.05;
    const hashes = { results: resultsSha256(stored) };
    const whole = revisionSha256({ schemeId: revision.schemeId, number: revision.number, authorId: revision.authorId, engineVersion: revision.engineVersion!, inputsSha256: revision.inputsSha256!, resultsSha256: hashes.results, submittedAt: revision.submittedAt! });
    await behindTheTriggers('UPDATE revisions SET results_json = :json, results_sha256 = :r, revision_sha256 = :w WHERE id = :id', { json: JSON.stringify(stored), r: hashes.results, w: whole, id: revision.id });

    const check = await checkFrozenRevision((await Revision.findByPk(revision.id))!);
    expect(check).toMatchObject({ inputsIntact: true, resultsIntact: true, revisionIntact: true });
    expect(check.rerun.matches).toBe(false);
    expect(check.differences.map((d) => d.field)).toContain(`${stored.events[0].name}: head over the crest`);
    signedInAs(checker.sessionUser);
    const result = await refusedWithoutChange(() => countersignRevisionAction({ revisionId: revision.id, password: checker.password, confirmed: true }));
    expect(result).toMatchObject({ ok: false, status: 409, error: expect.stringMatching(/does not reproduce/) });
  });
});

describe('bad input is named at its field and stores nothing', () => {
  it('refuses a wrong password, an unticked statement, an empty comment, an unknown part and a short summary', async () => {
    const { revision } = await submittedRevision();
    signedInAs(checker.sessionUser);
    const cases: [() => Promise<unknown>, number, string][] = [
      [() => countersignRevisionAction({ revisionId: revision.id, password: checker.password, confirmed: false }), 400, 'confirmed'],
      [() => addReviewCommentAction({ revisionId: revision.id, part: 'structure', body: '  ' }), 400, 'body'],
      [() => addReviewCommentAction({ revisionId: revision.id, part: 'weather', body: 'A comment on nothing.' }), 400, 'part'],
      [() => returnRevisionAction({ revisionId: revision.id, summary: 'Fix it' }), 400, 'summary'],
    ];
    for (const [call, status, path] of cases) expect(await refusedWithoutChange(call)).toMatchObject({ ok: false, status, issues: [expect.objectContaining({ path })] });
  });

  it('refuses a wrong countersigning password, storing only the counted attempt and its audit entry', async () => {
    const { revision } = await submittedRevision();
    signedInAs(checker.sessionUser);
    const before = await tableSnapshot();
    const result = await countersignRevisionAction({ revisionId: revision.id, password: 'not-my-password', confirmed: true });
    expect(result).toMatchObject({ ok: false, status: 400, issues: [expect.objectContaining({ path: 'password' })] });
    expect(await tableSnapshot()).toEqual({ ...before, audit_events: before.audit_events + 1, sign_in_attempts: expect.any(Number) });
    expect((await Revision.findByPk(revision.id))?.status).toBe('submitted');
  });

  it('refuses to submit an incomplete draft, naming the missing fields', async () => {
    const { revision } = await createTestScheme(designer.user.id, demoCase(undefined, (c) => delete c.events));
    signedInAs(designer.sessionUser);
    const result = await refusedWithoutChange(() => submitForCheckAction({ revisionId: revision.id, checkerId: '' }));
    expect(result).toMatchObject({ ok: false, status: 422, issues: [expect.objectContaining({ path: 'events' })] });
  });

  it('hides other designers’ revisions (404), and refuses a return without a decision to change', async () => {
    const { revision } = await createTestScheme(designer.user.id);
    signedInAs((await createTestUser('designer')).sessionUser);
    expect(await refusedWithoutChange(() => submitForCheckAction({ revisionId: revision.id, checkerId: '' }))).toMatchObject({ ok: false, status: 404 });
    signedInAs(checker.sessionUser);
    expect(await refusedWithoutChange(() => returnRevisionAction({ revisionId: revision.id, summary: 'This draft is not submitted yet.' }))).toMatchObject({ ok: false, status: 409 });
  });
});
