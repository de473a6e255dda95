import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { POST as evaluate } from '@/app/api/evaluate/route';
import { GET as health } from '@/app/api/health/route';
import { GET as schemes } from '@/app/api/schemes/route';
import { MAX_EVENTS } from '@/lib/validation/input-limits';
import { longSurveyCase, manyEventsCase } from './support/large-cases';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// A short limit per job keeps this file quick whatever the engine's speed; the pool reads it when first loaded.
vi.hoisted(() => {
  process.env.ENGINE_TIME_LIMIT_MS = '4000';
});

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => {
  db = await useTestDatabase();
  signedInAs((await createTestUser('designer')).sessionUser);
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const noParams = { params: Promise.resolve({}) };
const post = (body: unknown) => evaluate(new Request('http://localhost/api/evaluate', { method: 'POST', body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }), noParams);

/** Resolves with the response and records, in `order`, when it was answered relative to the others. */
function answered(name: string, order: string[], pending: Promise<Response>) {
  return pending.then((response) => {
    order.push(name);
    return response;
  });
}

describe('the engine runs off the request thread', () => {
  it('answers other requests while a 300-event case and a 400-section survey are being evaluated, and never with a 5xx', async () => {
    const before = await tableSnapshot();
    const order: string[] = [];
    const tooMany = answered('300 events', order, post(manyEventsCase(300)));
    const mostEvents = answered(`${MAX_EVENTS} events`, order, post(manyEventsCase(MAX_EVENTS)));
    const longSurvey = answered('400 sections', order, post(longSurveyCase(400)));
    // Let the large cases reach the workers before the other requests are made.
    await new Promise((resolve) => setImmediate(resolve));
    const others = [answered('health', order, Promise.resolve(health())), answered('schemes', order, schemes(new Request('http://localhost/api/schemes'), noParams))];

    const [healthResponse, schemesResponse] = await Promise.all(others);
    expect(healthResponse.status).toBe(200);
    expect(schemesResponse.status).toBe(200);
    const [tooManyResponse, mostEventsResponse, longSurveyResponse] = await Promise.all([tooMany, mostEvents, longSurvey]);

    // The cheap requests were answered while both large evaluations were still running.
    expect(order.indexOf('health')).toBeLessThan(order.indexOf(`${MAX_EVENTS} events`));
    expect(order.indexOf('schemes')).toBeLessThan(order.indexOf(`${MAX_EVENTS} events`));
    expect(order.indexOf('health')).toBeLessThan(order.indexOf('400 sections'));
    expect(order.indexOf('schemes')).toBeLessThan(order.indexOf('400 sections'));

    expect(tooManyResponse.status).toBe(400);
    const refused = await tooManyResponse.json();
    expect(refused.issues).toContainEqual({ path: 'events', message: `Flood events are too many: at most ${MAX_EVENTS} per case (this one has 300); reduce them to ${MAX_EVENTS} or fewer` });

    for (const response of [mostEventsResponse, longSurveyResponse]) {
      expect([200, 422]).toContain(response.status);
      const body = await response.json();
      if (response.status === 200) expect(body.result.events.length).toBeGreaterThan(0);
      else {
        expect(body.error).toMatch(/takes too long to evaluate|too large for the engine/);
        expect(body.issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining([expect.stringMatching(/^(events|reach\.sections)$/)]));
      }
    }
    expect(await tableSnapshot()).toEqual(before);
  });

  it('gives the same result off the thread as before: the demo case evaluates with its two events', async () => {
    const response = await post(manyEventsCase(2));
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.status).toBe('evaluated');
    expect(body.result.events.map((e: { name: string }) => e.name)).toEqual(['Event 1', 'Event 2']);
  });
});
