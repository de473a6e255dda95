import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dotted, garbageJsonText, mutatedJsonText, nestedArrays } from '../support/hostile-json';
import { ACTION_ACCESS, ROUTE_ACCESS } from './support/access-matrix';
import { expectPreviewIssues, expectRefusal, refusalOf, withoutChange } from './support/hostile-checks';
import { ACTION_TARGETS, JSON_BODY_TARGETS, RAW_BODY_TARGETS, type JsonBodyTarget } from './support/hostile-targets';
import { usePortalWorld, type Person, type PortalWorld } from './support/portal-world';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';

// Random and hostile bodies sent to every route handler that reads one, as the role allowed to call it:
// each is refused with 400 (413 when oversized) and field paths, never a 500, and changes nothing stored.
// Server actions are fuzzed the same way in hostile-input-actions.test.ts.

const RUNS = 30;
const portal = usePortalWorld();


const as = (person: Person) => signedInAs(portal.world.people[person].sessionUser);
const split = (key: string) => {
  const [method, route] = key.split(' ');
  return { method, route: route.replace(/^api\//, '') };
};

function sendJson(key: string, target: Pick<JsonBodyTarget, 'role' | 'id' | 'query'>, body: BodyInit, headers: Record<string, string> = {}) {
  const { method, route } = split(key);
  as(target.role);
  return callRoute(route, method, { id: target.id?.(portal.world), query: target.query?.(portal.world), body, headers: { 'content-type': 'application/json', ...headers } });
}

describe('the fuzz targets cover every route that reads a body', () => {
  it('lists every POST, PUT and PATCH of the access matrix, with a role the matrix allows', () => {
    for (const [route, methods] of Object.entries(ROUTE_ACCESS)) {
      for (const [method, access] of Object.entries(methods)) {
        if (method === 'GET') continue;
        const key = `${method} ${route}`;
        const targets = [...(JSON_BODY_TARGETS[key] ?? []), ...(RAW_BODY_TARGETS[key] ? [RAW_BODY_TARGETS[key]] : [])];
        expect(targets.length, `${key} has no fuzz target in support/hostile-targets.ts`).toBeGreaterThan(0);
        for (const t of targets) expect(access === 'public' || access.includes(portal.world.people[t.role].sessionUser.role), `${key} fuzzed as ${t.role}`).toBe(true);
      }
    }
    for (const [folder, actions] of Object.entries(ACTION_ACCESS)) for (const name of Object.keys(actions)) expect(ACTION_TARGETS[`${folder} ${name}`], `${folder} ${name} has no fuzz target`).toBeDefined();
  });
});

describe('JSON bodies', () => {
  for (const [key, targets] of Object.entries(JSON_BODY_TARGETS)) {
    targets.forEach((target, index) => {
      const label = targets.length > 1 ? `${key} #${index + 1}` : key;

      it(`${label}: garbage bodies get 400 with field paths and change nothing`, async () => {
        await fc.assert(
          fc.asyncProperty(garbageJsonText({ objects: !target.objectsAreValid }), async (text) => {
            const refusal = await withoutChange(async () => refusalOf(await sendJson(key, target, text)));
            expectRefusal(refusal, { label: `${label} ${JSON.stringify(text.slice(0, 60))}` });
          }),
          { numRuns: RUNS },
        );
      });

      it(`${label}: a field of the wrong type, a huge number or a deep nest gets 400 naming that field`, async () => {
        await fc.assert(
          fc.asyncProperty(mutatedJsonText(target.valid(portal.world)), async ({ path, text }) => {
            const refusal = await withoutChange(async () => refusalOf(await sendJson(key, target, text)));
            expectRefusal(refusal, { label: `${label} at ${dotted(path)}`, field: (target.fieldOf ?? dotted)(path) });
          }),
          { numRuns: RUNS * 2 },
        );
      });
    });

    it(`${key}: a 10 MB body gets 413, whether its length is declared or it is streamed`, async () => {
      const target = targets[0];
      const big = JSON.stringify({ padding: 'x'.repeat(10 * 1024 * 1024) });
      const declared = await withoutChange(async () => refusalOf(await sendJson(key, target, 'x', { 'content-length': String(big.length) })));
      expectRefusal(declared, { statuses: [413], label: `${key} declared` });
      const chunk = new TextEncoder().encode(big.slice(0, 256 * 1024));
      let sent = 0;
      const stream = new ReadableStream<Uint8Array>({
        pull(controller) {
          if (sent >= 10 * 1024 * 1024) return controller.close();
          sent += chunk.byteLength;
          controller.enqueue(chunk);
        },
      });
      expectRefusal(await withoutChange(async () => refusalOf(await sendJson(key, target, stream))), { statuses: [413], label: `${key} streamed` });
      expect(sent, 'the body was read no further than the limit').toBeLessThan(2 * 1024 * 1024);
    });
  }
});

describe('file bodies', () => {
  const bytes = fc.oneof(
    fc.uint8Array({ maxLength: 300 }),
    fc.string({ maxLength: 300 }).map((s) => new TextEncoder().encode(s)),
    garbageJsonText().map((s) => new TextEncoder().encode(s)),
    fc.constantFrom(new TextEncoder().encode(nestedArrays(200_000)), new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a]), new Uint8Array([0xff, 0xfe, 0x00, 0x41])),
  );
  for (const [key, target] of Object.entries(RAW_BODY_TARGETS)) {
    it(`${key}: random bytes and garbage text are refused (400, or 422 for a binary file) and change nothing`, async () => {
      await fc.assert(
        fc.asyncProperty(bytes, async (body) => {
          const refusal = await withoutChange(async () => refusalOf(await sendJson(key, target, body, { 'content-type': target.contentType })));
          const label = `${key} ${Buffer.from(body.slice(0, 30)).toString('hex')}`;
          if (target.previewReportsIssues && refusal.status === 200) expectPreviewIssues(refusal, label);
          else expectRefusal(refusal, { statuses: [400, 422], label });
        }),
        { numRuns: RUNS },
      );
    });
    const validJson = target.validJson;
    if (validJson) {
      it(`${key}: a case file with a field of the wrong type gets 400 naming that field`, async () => {
        await fc.assert(
          fc.asyncProperty(mutatedJsonText(validJson()), async ({ path, text }) => {
            const refusal = await withoutChange(async () => refusalOf(await sendJson(key, target, text, { 'content-type': target.contentType })));
            expectRefusal(refusal, { label: `${key} at ${dotted(path)}`, field: dotted(path) });
          }),
          { numRuns: RUNS * 2 },
        );
      });
    }
  }
});

describe('query strings', () => {
  const value = fc.oneof(fc.string({ maxLength: 30 }), fc.constantFrom('NaN', '1e400', '-1', '0', '1.5', 'Infinity', '%00', '../../etc/passwd', '[]', '{}', '9'.repeat(400), 'x'.repeat(5000), '__proto__'));
  const GETS: [route: string, person: Person, id: (w: PortalWorld) => string, params: string[]][] = [
    ['certificates', 'planning', () => 'none', ['q', 'status', 'from', 'to', 'sort', 'direction', 'page']],
    ['parcels/[id]', 'liaison', (w) => w.certified.schemeId, ['version']],
    ['parcels/[id]/impact', 'liaison', (w) => w.certified.schemeId, ['revision']],
    ['schemes/[id]/case-file', 'designer', (w) => w.certified.schemeId, ['revision']],
    ['schemes/[id]/step-table', 'designer', (w) => w.certified.schemeId, ['revision', 'event']],
    ['schemes/[id]/routing-table', 'designer', (w) => w.certified.schemeId, ['revision', 'event']],
  ];
  for (const [route, person, id, params] of GETS) {
    it(`GET api/${route}: hostile parameters get an answer or a 4xx that says why, never a 500`, async () => {
      await fc.assert(
        fc.asyncProperty(fc.dictionary(fc.constantFrom(...params, '__proto__', 'constructor'), value, { maxKeys: params.length + 1 }), async (query) => {
          as(person);
          const response = await callRoute(route, 'GET', { id: id(portal.world), query: new URLSearchParams(query).toString() });
          expect(response.status, `${route}?${JSON.stringify(query).slice(0, 200)}`).toBeLessThan(500);
          if (response.status >= 400) expectRefusal(await refusalOf(response), { statuses: [400, 404, 422], label: route });
        }),
        { numRuns: RUNS },
      );
    });
  }
});
