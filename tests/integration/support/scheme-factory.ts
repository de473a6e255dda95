import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Certificate, Revision, Scheme, database } from '@/lib/db';
import { countersignRevision } from '@/lib/review/countersign-revision';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import type { createTestUser } from './user-factory';

type TestPerson = Awaited<ReturnType<typeof createTestUser>>;

export const DEMO_CASES = path.resolve('db', 'seeds', 'cases');

/** A demo case file (the invented River Wendle scenario) as its JSON value, optionally changed by `edit`. */
export function demoCase(name = 'wendle-harrowfield-broad-crested.json', edit?: (value: Record<string, unknown>) => void): Record<string, unknown> {
  const value = JSON.parse(readFileSync(path.join(DEMO_CASES, name), 'utf8')) as Record<string, unknown>;
  edit?.(value);
  return value;
}

/** A scheme of its own for one test, owned by the given designer, with a first draft revision of a demo case. */
export async function createTestScheme(designerId: string, inputs: unknown = demoCase()) {
  database();
  const id = randomUUID();
  const scheme = await Scheme.create({ id, reference: `SM-T${id.slice(0, 6).toUpperCase()}`, name: 'Harrowfield Mill weir renewal (test)', watercourse: 'River Wendle', site: 'Harrowfield Mill, Wendle Valley', description: null, designerId });
  const revision = await createDraftRevision({ schemeId: scheme.id, authorId: designerId, number: 1, inputs });
  return { scheme, revision };
}

/** A draft revision, as the wizard leaves it: inputs only, nothing frozen. */
export async function createDraftRevision({ schemeId, authorId, number, inputs, basedOnRevisionId = null }: { schemeId: string; authorId: string; number: number; inputs: unknown; basedOnRevisionId?: string | null }) {
  database();
  return Revision.create({
    id: randomUUID(),
    schemeId,
    number,
    wizardStep: 'results',
    inputsJson: JSON.stringify(inputs),
    resultsJson: null,
    inputsSha256: null,
    resultsSha256: null,
    revisionSha256: null,
    engineVersion: null,
    authorId,
    checkerId: null,
    basedOnRevisionId,
    submittedAt: null,
    countersignedAt: null,
  });
}

/** A scheme whose first revision has been submitted and countersigned through the real use cases: a signed certificate. */
export async function createCertifiedScheme(people: { designer: TestPerson; checker: TestPerson }, inputs: unknown = demoCase()) {
  const { scheme, revision } = await createTestScheme(people.designer.user.id, inputs);
  await submitForCheck({ revisionId: revision.id, checkerId: people.checker.user.id, designer: people.designer.sessionUser, baseUrl: 'http://localhost:3000' });
  const countersigned = await countersignRevision({ input: { revisionId: revision.id, password: people.checker.password, confirmed: true }, checker: people.checker.sessionUser, baseUrl: 'http://localhost:3000' });
  const certificate = (await Certificate.findByPk(countersigned.certificateId))!;
  return { scheme, revision, certificate };
}
