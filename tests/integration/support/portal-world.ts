import { afterAll, beforeAll } from 'vitest';
import type { Role } from '@/lib/auth/roles';
import { Letter, database } from '@/lib/db';
import { generateLettersAction } from '@/app/(portal)/liaison/[id]/letters/actions';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { demoParcelsCsv } from './liaison-fixtures';
import { createCertifiedScheme, createDraftRevision, createTestScheme, demoCase } from './scheme-factory';
import { callRoute } from './scheme-requests';
import { signedInAs } from './session-double';
import { useTestDatabase } from './test-database';
import { createTestUser } from './user-factory';

type TestPerson = Awaited<ReturnType<typeof createTestUser>>;

export const PEOPLE = ['designer', 'otherDesigner', 'checker', 'otherChecker', 'liaison', 'planning', 'admin'] as const;
export type Person = (typeof PEOPLE)[number];
export const PERSON_ROLE: Record<Person, Role> = { designer: 'designer', otherDesigner: 'designer', checker: 'checker', otherChecker: 'checker', liaison: 'liaison', planning: 'planning', admin: 'admin' };

/**
 * One of everything a role can own, for tests that call every route as its owner and as someone else:
 * a draft, a submitted revision assigned to `checker`, and a certified scheme (checked by `checker`) with a
 * parcels register, a batch of letters and a later draft (revision 2). `otherDesigner` and `otherChecker` own or check none of it.
 */
export async function createPortalWorld() {
  const people = {} as Record<Person, TestPerson>;
  for (const person of PEOPLE) people[person] = await createTestUser(PERSON_ROLE[person]);

  const draft = await createTestScheme(people.designer.user.id);
  const submitted = await createTestScheme(people.designer.user.id);
  await submitForCheck({ revisionId: submitted.revision.id, checkerId: people.checker.user.id, designer: people.designer.sessionUser, baseUrl: 'http://localhost:3000' });
  const certified = await createCertifiedScheme({ designer: people.designer, checker: people.checker });
  const laterDraft = await createDraftRevision({ schemeId: certified.scheme.id, authorId: people.designer.user.id, number: 2, inputs: demoCase(), basedOnRevisionId: certified.revision.id });

  signedInAs(people.liaison.sessionUser);
  const upload = await callRoute('parcels/[id]/csv', 'POST', { id: certified.scheme.id, body: new Uint8Array(demoParcelsCsv()), headers: { 'content-type': 'text/csv' } });
  if (upload.status !== 201) throw new Error(`parcels upload failed: ${upload.status} ${await upload.text()}`);
  const generated = await generateLettersAction({ schemeId: certified.scheme.id, revisionId: certified.revision.id });
  if (!generated.ok) throw new Error(`letters failed: ${generated.error}`);
  signedInAs(null);
  database();
  const letter = (await Letter.findOne({ where: { batchId: generated.data.batchId } }))!;

  return {
    people,
    draft: { schemeId: draft.scheme.id, revisionId: draft.revision.id },
    submitted: { schemeId: submitted.scheme.id, revisionId: submitted.revision.id },
    certified: { schemeId: certified.scheme.id, revisionId: certified.revision.id, certificateId: certified.certificate.id, registerId: (await upload.json()).registerId as string | undefined, laterDraftId: laterDraft.id },
    letters: { batchId: generated.data.batchId, letterId: letter.id },
  };
}
export type PortalWorld = Awaited<ReturnType<typeof createPortalWorld>>;

/**
 * For one test file: a fresh database with the world in it, made before the file's tests; afterwards nobody is
 * signed in and the database is removed. Read `world` inside hooks and tests only.
 */
export function usePortalWorld(): { readonly world: PortalWorld } {
  let db: Awaited<ReturnType<typeof useTestDatabase>> | undefined;
  let world: PortalWorld | undefined;
  beforeAll(async () => {
    db = await useTestDatabase();
    world = await createPortalWorld();
  });
  afterAll(async () => {
    signedInAs(null);
    await db?.cleanup();
  });
  return {
    get world() {
      if (!world) throw new Error('the portal world is made in beforeAll: use it inside a hook or a test');
      return world;
    },
  };
}
