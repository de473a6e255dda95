import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { Scheme } from '@/lib/db';
import { ACTION_ACCESS, ACTION_OWNERSHIP, ROUTE_ACCESS, ROUTE_OWNERSHIP, type Access, type Ownership } from './support/access-matrix';
import { databaseDigest } from './support/database-digest';
import { OWNED_ACTION_CALLS, OWNED_ROUTE_CALLS, OWNERS, WRONG_OWNERS } from './support/ownership-calls';
import { PERSON_ROLE, type Person, usePortalWorld } from './support/portal-world';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';

// The "wrong owner" column of the role matrix: someone of an allowed role who does not own the record gets 404
// (403 for a revision assigned to another checker), never 2xx, and nothing changes; its owner gets past the check.

const APP = path.resolve('src/app');
const portal = usePortalWorld();
let references: string[];

beforeAll(async () => {
  references = (await Scheme.findAll()).map((s) => s.reference);
});

const as = (person: Person) => signedInAs(portal.world.people[person].sessionUser);
const allows = (access: Access, person: Person) => access === 'public' || access.includes(PERSON_ROLE[person]);
type Owned = Exclude<Ownership, 'none' | 'shared'>;
const owned = (o: Ownership): o is Owned => o !== 'none' && o !== 'shared';

const routes = Object.entries(ROUTE_ACCESS).flatMap(([route, methods]) => Object.entries(methods).map(([method, access]) => ({ key: `${method} ${route}`, route, method, access, ownership: ROUTE_OWNERSHIP[route]?.[method as 'GET'] })));
const actions = Object.entries(ACTION_ACCESS).flatMap(([folder, names]) => Object.entries(names).map(([name, access]) => ({ key: `${folder} ${name}`, folder, name, access, ownership: ACTION_OWNERSHIP[folder]?.[name] })));

async function callOwnedRoute(entry: (typeof routes)[number]): Promise<{ status: number; text: string }> {
  const response = await callRoute(entry.route.replace(/^api\//, ''), entry.method, OWNED_ROUTE_CALLS[entry.key](portal.world));
  return { status: response.status, text: await response.text() };
}

async function callOwnedAction(entry: (typeof actions)[number], who: Person): Promise<{ status: number; text: string }> {
  const module = (await import(path.join(APP, entry.folder, 'actions.ts'))) as Record<string, (raw: unknown) => Promise<{ ok: boolean; status?: number }>>;
  const answer = await module[entry.name](OWNED_ACTION_CALLS[entry.key](portal.world, who));
  return { status: answer.ok ? 200 : (answer.status ?? 0), text: JSON.stringify(answer) };
}

describe('every route and action has decided whose record it acts on', () => {
  it('has an ownership for each entry of the access matrix, and a call for each owned one', () => {
    for (const e of [...routes, ...actions]) {
      expect(e.ownership, `${e.key} has no entry in ROUTE_OWNERSHIP / ACTION_OWNERSHIP`).toBeDefined();
      if (e.ownership && owned(e.ownership)) expect(OWNED_ROUTE_CALLS[e.key] ?? OWNED_ACTION_CALLS[e.key], `${e.key} has no call in support/ownership-calls.ts`).toBeDefined();
      if (e.ownership && owned(e.ownership)) expect(WRONG_OWNERS[e.ownership].some((w) => allows(e.access, w.who)), `${e.key}: no wrong owner of an allowed role`).toBe(true);
    }
  });
});

const call = (e: (typeof routes)[number] | (typeof actions)[number], who: Person) => ('route' in e ? callOwnedRoute(e) : callOwnedAction(e, who));

describe('a user of the allowed role who does not own the record is refused, and nothing changes', () => {
  for (const e of [...routes, ...actions]) {
    const ownership = e.ownership;
    if (!ownership || !owned(ownership)) continue;
    for (const { who, status } of WRONG_OWNERS[ownership]) {
      // A role refused outright is access-control.test.ts's concern.
      if (!allows(e.access, who)) continue;
      it(`${e.key} as ${who}: ${status}`, async () => {
        as(who);
        const before = await databaseDigest();
        const answer = await call(e, who);
        expect(answer.status, answer.text.slice(0, 300)).toBe(status);
        expect(await databaseDigest(), 'nothing changes').toBe(before);
        for (const reference of references) expect(answer.text, 'the refusal names no scheme').not.toContain(reference);
      });
    }
  }

  it('a planning officer sees no draft of a certified scheme (only its countersigned revision)', async () => {
    as('planning');
    expect((await callRoute('schemes/[id]', 'GET', { id: portal.world.certified.schemeId })).status).toBe(200);
    expect((await callRoute('revisions/[id]', 'GET', { id: portal.world.certified.revisionId })).status).toBe(200);
    expect((await callRoute('revisions/[id]', 'GET', { id: portal.world.certified.laterDraftId })).status).toBe(404);
    expect((await callRoute('evaluate', 'POST', { json: { revisionId: portal.world.certified.laterDraftId } })).status).toBe(404);
    expect((await callRoute('schemes/[id]/case-file', 'GET', { id: portal.world.certified.schemeId, query: 'revision=2' })).status).toBe(404);
    const latest = await callRoute('schemes/[id]/case-file', 'GET', { id: portal.world.certified.schemeId });
    expect(latest.status).toBe(200);
    expect(JSON.parse(await latest.text()).scheme).toMatchObject({ revision: 1, status: 'countersigned' });
  });
});

// Last, because owners' calls change things (a draft is submitted, a revision returned).
describe('the owner gets past the same check (so the refusals above are about ownership)', () => {
  for (const e of [...routes, ...actions]) {
    const ownership = e.ownership;
    if (!ownership || !owned(ownership)) continue;
    for (const who of OWNERS[ownership].filter((p) => allows(e.access, p))) {
      it(`${e.key} as ${who}`, async () => {
        as(who);
        const answer = await call(e, who);
        expect([401, 403, 404], answer.text.slice(0, 300)).not.toContain(answer.status);
        expect(answer.status, answer.text.slice(0, 300)).toBeLessThan(500);
      });
    }
  }
});
