import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseParcelsCsv } from '@/lib/parcels/parcels-csv';
import { ROUTE_ACCESS, type Access } from './support/access-matrix';
import { demoParcelsCsv } from './support/liaison-fixtures';
import { PERSON_ROLE, usePortalWorld, type Person, type PortalWorld } from './support/portal-world';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';

// Landowners' names, addresses and e-mails reach only the liaison officers, admins and the scheme's own designer
// and checker; and the audit log has no way in code to be changed or deleted.

const APP = path.resolve('src/app');
const portal = usePortalWorld();

const owners = parseParcelsCsv(demoParcelsCsv().toString('utf8')).rows.flatMap((r) => (r.parcel ? [r.parcel] : []));
const personalData = owners.flatMap((p) => [p.ownerName, p.postalAddress, p.email].filter((v): v is string => Boolean(v)));

// next.config.mjs turns on experimental.authInterrupts (forbidden()); `next build` passes it to the server this way.
process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = 'true';

const allows = (access: Access, person: Person) => access === 'public' || access.includes(PERSON_ROLE[person]);
const ids = (w: PortalWorld) => [w.certified.schemeId, w.certified.revisionId, w.certified.laterDraftId, w.certified.certificateId, w.draft.schemeId, w.draft.revisionId, w.letters.letterId, w.letters.batchId];
const leaks = (text: string) => personalData.filter((value) => text.includes(value));

async function everyGet(person: Person): Promise<{ what: string; status: number; text: string }[]> {
  const answers = [];
  for (const [route, methods] of Object.entries(ROUTE_ACCESS)) {
    if (!methods.GET || !allows(methods.GET, person)) continue;
    for (const id of route.includes('[id]') ? ids(portal.world) : ['none']) {
      signedInAs(portal.world.people[person].sessionUser);
      const response = await callRoute(route.replace(/^api\//, ''), 'GET', { id });
      answers.push({ what: `GET /${route} ${id}`, status: response.status, text: Buffer.from(await response.arrayBuffer()).toString('latin1') });
    }
  }
  return answers;
}

describe('owner details in GET responses', () => {
  it('the search finds them where they belong: the liaison officer’s register', async () => {
    expect(personalData.length).toBeGreaterThan(10);
    signedInAs(portal.world.people.liaison.sessionUser);
    const register = await callRoute('parcels/[id]', 'GET', { id: portal.world.certified.schemeId });
    expect(leaks(await register.text()).length).toBeGreaterThan(0);
  });

  for (const person of ['planning', 'otherDesigner', 'otherChecker'] as const) {
    it(`no GET route gives a ${person === 'planning' ? 'planning officer' : person === 'otherDesigner' ? 'designer of other schemes' : 'checker of other schemes'} any landowner’s name, address or e-mail`, async () => {
      const answers = await everyGet(person);
      expect(answers.some((a) => a.status === 200)).toBe(true);
      for (const answer of answers) expect(leaks(answer.text), `${answer.what} (${answer.status})`).toEqual([]);
    });
  }
});

describe('owner details in pages', () => {
  const liaisonPages = ['liaison/[id]', 'liaison/[id]/letters/[letterId]', 'liaison/[id]/register', 'liaison/[id]/register/history', 'liaison/[id]/impact', 'liaison/[id]/letters', 'liaison/[id]/template', 'liaison/[id]/upload'];
  for (const person of ['planning', 'otherDesigner', 'otherChecker'] as const) {
    it(`every liaison page refuses ${person} before rendering anything (403 or 404 page)`, async () => {
      for (const page of liaisonPages) {
        const module = (await import(path.join(APP, '(portal)', page, 'page.tsx'))) as { default: (props: unknown) => Promise<unknown> };
        signedInAs(portal.world.people[person].sessionUser);
        const rendering = module.default({ params: Promise.resolve({ id: portal.world.certified.schemeId, letterId: portal.world.letters.letterId }), searchParams: Promise.resolve({}) });
        await expect(rendering, page).rejects.toMatchObject({ digest: expect.stringMatching(/^NEXT_HTTP_ERROR_FALLBACK;(403|404)$/) });
      }
    });
  }
});

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? sourceFiles(full) : /\.(ts|tsx|mjs|js)$/.test(name) ? [full] : [];
  });
}

describe('the audit log is append-only', () => {
  it('no code outside the tests updates or deletes audit events', () => {
    const forbidden = [/AuditEvent\s*\.\s*(update|destroy|upsert|truncate|bulkCreate|restore)\b/, /\bUPDATE\s+"?audit_events\b/i, /\bDELETE\s+FROM\s+"?audit_events\b/i, /\bDROP\s+TRIGGER\b[^`']*audit_events/i];
    const files = [...sourceFiles(path.resolve('src')), ...sourceFiles(path.resolve('db'))];
    expect(files.length).toBeGreaterThan(50);
    for (const file of files) {
      const text = readFileSync(file, 'utf8');
      for (const pattern of forbidden) expect(pattern.test(text), `${path.relative('.', file)} matches ${pattern}`).toBe(false);
    }
  });
});
