import { spawnSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST } from '@/app/api/evaluate/route';
import { demoCase } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => {
  db = await useTestDatabase();
  signedInAs((await createTestUser('planning')).sessionUser);
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const post = (body: unknown) => POST(new Request('http://localhost/api/evaluate', { method: 'POST', body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }), { params: Promise.resolve({}) });

describe('POST /api/evaluate with a case file', () => {
  it('answers exactly what `npm run evaluate` prints for the same file (one evaluator)', async () => {
    const file = 'db/seeds/cases/wendle-harrowfield-depth-control.json';
    const response = await post(demoCase('wendle-harrowfield-depth-control.json'));
    expect(response.status).toBe(200);
    const { result } = await response.json();
    const cli = spawnSync('npm', ['run', '--silent', 'evaluate', '--', file], { encoding: 'utf8' });
    expect(cli.status, cli.stderr).toBe(0);
    expect(result).toEqual(JSON.parse(cli.stdout));
  });

  it('routes a flood through a reservoir off the request thread, as `npm run evaluate` does', async () => {
    const file = 'db/seeds/cases/wendle-harrowfield-reservoir-spillway.json';
    const response = await post(demoCase('wendle-harrowfield-reservoir-spillway.json'));
    expect(response.status).toBe(200);
    const { result } = await response.json();
    expect(result.events[1].routing.method).toBe('modified-puls');
    const cli = spawnSync('npm', ['run', '--silent', 'evaluate', '--', file], { encoding: 'utf8' });
    expect(cli.status, cli.stderr).toBe(0);
    expect(result).toEqual(JSON.parse(cli.stdout));
  });

  it('names the field of an invalid case and stores nothing', async () => {
    const before = await tableSnapshot();
    const response = await post(demoCase('wendle-harrowfield-depth-control.json', (c) => ((c.reach as { section: { bottomWidth: number } }).section.bottomWidth = -9)));
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(body.issues.map((i: { path: string }) => i.path)).toContain('reach.section.bottomWidth');
    expect(await tableSnapshot()).toEqual(before);
  });

  it('explains a physically impossible case (control below critical depth) as 422', async () => {
    const response = await post(demoCase('wendle-harrowfield-depth-control.json', (c) => ((c.control as { depth: number }).depth = 0.2)));
    expect(response.status).toBe(422);
    const body = await response.json();
    expect(body.code).toBe('control-below-critical');
    expect(body.error).toMatch(/critical depth/);
  });
});
