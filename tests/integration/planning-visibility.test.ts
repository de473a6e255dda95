import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ResultsPage from '@/app/(portal)/schemes/[id]/results/page';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { AuditEvent, type Revision, type Scheme, database } from '@/lib/db';
import { stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { loadRevisionView } from '@/lib/review/load-revision-view';
import { callRoute } from './support/scheme-requests';
import { createCertifiedScheme, createDraftRevision, demoCase } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// Issue 14 §6 and §7: a planning officer reads certified revisions only. A later draft of a certified scheme must not
// show on the scheme's JSON, its page, the revision page or the results sheet, and asking for it answers "not found".

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let planning: Person;
let scheme: Scheme;
let certified: Revision;
let draft: Revision;

beforeAll(async () => {
  db = await useTestDatabase();
  const designer = await createTestUser('designer');
  const checker = await createTestUser('checker');
  planning = await createTestUser('planning');
  ({ scheme, revision: certified } = await createCertifiedScheme({ designer, checker }));
  draft = await createDraftRevision({ schemeId: scheme.id, authorId: designer.user.id, number: 2, inputs: demoCase(), basedOnRevisionId: certified.id });
  await database().transaction((transaction) => recordAuditEvent({ actorId: designer.user.id, action: 'revision.draft-created', entityType: 'revision', entityId: draft.id, schemeId: scheme.id, details: { number: 2, origin: 'revision 1' } }, transaction));
});
afterAll(async () => {
  signedInAs(null);
  await stopLocalSmtpServer();
  await db.cleanup();
});

/** Where Next's notFound() was called: its error carries this digest. */
async function digestOf(rendering: Promise<unknown>): Promise<string | null> {
  try {
    await rendering;
    return null;
  } catch (error) {
    const digest = (error as { digest?: unknown }).digest;
    if (typeof digest === 'string') return digest;
    throw error;
  }
}

const results = (revision?: string) => ResultsPage({ params: Promise.resolve({ id: scheme.id }), searchParams: Promise.resolve(revision === undefined ? {} : { revision }) });

describe('a planning officer and a scheme whose latest revision is a draft', () => {
  it('reads the scheme as JSON with its certified revisions only: no draft, no draft id, no draft history', async () => {
    signedInAs(planning.sessionUser);
    const response = await callRoute('schemes/[id]', 'GET', { id: scheme.id });
    expect(response.status).toBe(200);
    const text = await response.text();
    const body = JSON.parse(text) as { openDraft: unknown; revisions: { id: string; status: string }[] };
    expect(body.openDraft).toBeNull();
    expect(body.revisions.map((r) => [r.id, r.status])).toEqual([[certified.id, 'countersigned']]);
    expect(text).not.toContain(draft.id);
    expect(text).not.toContain('draft');
  });

  it('finds the scheme in the register with its latest certified revision, not the draft after it', async () => {
    signedInAs(planning.sessionUser);
    const response = await callRoute('schemes', 'GET');
    expect(response.status).toBe(200);
    const listed = JSON.stringify(await response.json());
    expect(listed).toContain(scheme.id);
    expect(listed).toContain('"latestRevision":{"number":1,"status":"countersigned"}');
    expect(listed).not.toContain('"draft"');
  });

  it('sees on the revision page neither the draft among the revisions nor its events in the history', async () => {
    const view = await loadRevisionView({ revisionId: certified.id, user: planning.sessionUser });
    expect(view.siblings).toEqual([{ id: certified.id, number: 1, status: 'countersigned' }]);
    const draftEvents = (await AuditEvent.findAll({ where: { entityId: draft.id } })).map((e) => e.id);
    expect(view.history.filter((e) => draftEvents.includes(e.id))).toEqual([]);
    expect(view.history.length).toBeGreaterThan(0);
    expect(JSON.stringify(view)).not.toContain(draft.id);
    await expect(loadRevisionView({ revisionId: draft.id, user: planning.sessionUser })).rejects.toThrow(/no such revision/);
  });

  it('gets the results sheet of the latest certified revision, and "not found" for the draft, never a server error', async () => {
    signedInAs(planning.sessionUser);
    expect(await digestOf(results())).toBeNull();
    expect(await digestOf(results('abc'))).toBeNull();
    expect(await digestOf(results('1'))).toBeNull();
    expect(await digestOf(results('2'))).toMatch(/404/);
    expect(await digestOf(results('3'))).toMatch(/404/);
  });

  it('still leaves the designer their draft', async () => {
    const designerView = await loadRevisionView({ revisionId: certified.id, user: { ...planning.sessionUser, id: scheme.designerId, role: 'designer' } });
    expect(designerView.siblings.map((s) => s.status)).toEqual(['countersigned', 'draft']);
  });
});
