import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { startApp, type RunningApp } from './support/app-server';
import { launchBrowser, signInAs } from './support/browser';

// Issue 14 §6 and §7 on the served production build: bad server-action bodies get 400 or 413, never 500, and a
// planning officer gets the certified revision or "not found", never a server error nor a glimpse of the draft.

let app: RunningApp;
let ids: { schemeId: string; certifiedId: string; draftId: string };
let signInActionId: string;

beforeAll(async () => {
  app = await startApp();
  const certified = spawnSync('npx', ['tsx', '--conditions=react-server', '--tsconfig', 'tsconfig.json', 'tests/e2e/support/certify-demo-scheme.ts'], { env: { ...process.env, DATABASE_PATH: app.databasePath }, encoding: 'utf8' });
  if (certified.status !== 0) throw new Error(`certifying the demo scheme failed: ${certified.stderr}`);
  ids = JSON.parse(certified.stdout.trim().split('\n').pop()!);
  const manifest = JSON.parse(readFileSync(path.join(process.env.NEXT_DIST_DIR ?? '.next', 'server', 'server-reference-manifest.json'), 'utf8')) as { node: Record<string, { exportedName?: string }> };
  signInActionId = Object.entries(manifest.node).find(([, v]) => v.exportedName === 'signInAction')![0];
});
afterAll(async () => app?.stop());

const callAction = (body: BodyInit | undefined, headers: Record<string, string> = {}) =>
  fetch(`${app.baseUrl}/sign-in`, { method: 'POST', headers: { 'next-action': signInActionId, accept: 'text/x-component', 'content-type': 'text/plain;charset=UTF-8', ...headers }, body });

describe('server action requests with bodies Next cannot decode', () => {
  it('still runs a well-formed call through to the action', async () => {
    const response = await callAction(JSON.stringify([{ email: 'nobody@example.test', password: 'wrong' }]));
    expect(response.status).toBe(200);
    expect(await response.text()).toMatch(/do not match an active account/);
  });

  it.each([
    { what: 'not JSON', body: 'this is not json', status: 400, reason: /not JSON/ },
    { what: 'empty', body: '', status: 400, reason: /empty/ },
    { what: 'nested brackets a hundred thousand deep', body: `${'['.repeat(100_000)}${']'.repeat(100_000)}`, status: 400, reason: /nests brackets/ },
    { what: 'over the 2 MiB limit', body: JSON.stringify(['a'.repeat(3 * 1024 * 1024)]), status: 413, reason: /larger than 2 MiB/ },
  ])('answers a body that is $what with $status and says why', async ({ body, status, reason }) => {
    const response = await callAction(body);
    expect(response.status).toBe(status);
    expect(((await response.json()) as { error: string }).error).toMatch(reason);
  });

  it('answers an over-limit body sent without a length (chunked) with 413', async () => {
    const big = new TextEncoder().encode(JSON.stringify(['b'.repeat(3 * 1024 * 1024)]));
    const stream = new ReadableStream<Uint8Array>({ start: (c) => (c.enqueue(big), c.close()) });
    const response = await fetch(`${app.baseUrl}/sign-in`, { method: 'POST', headers: { 'next-action': signInActionId, 'content-type': 'text/plain;charset=UTF-8' }, body: stream, duplex: 'half' } as RequestInit);
    expect(response.status).toBe(413);
  });
});

describe('a planning officer and a certified scheme whose latest revision is a draft', () => {
  it('gets the certified results, 404 for the draft, and no trace of the draft on the scheme and revision pages', async () => {
    const browser = await launchBrowser();
    try {
      const page = await browser.newPage();
      const planning = DEMO_USERS.find((u) => u.role === 'planning')!;
      await signInAs(page, app.baseUrl, planning.email, planning.password);
      const status = async (url: string) => (await page.goto(`${app.baseUrl}${url}`))?.status();
      expect(await status(`/schemes/${ids.schemeId}/results`)).toBe(200);
      await expect(page.getByText(/Results sheet · SM-0001 · revision 1/i).count()).resolves.toBeGreaterThan(0);
      expect(await status(`/schemes/${ids.schemeId}/results?revision=abc`)).toBe(200);
      expect(await status(`/schemes/${ids.schemeId}/results?revision=2`)).toBe(404);
      expect(await status(`/schemes/${ids.schemeId}/results?revision=3`)).toBe(404);
      expect(await status(`/revisions/${ids.draftId}`)).toBe(404);

      for (const url of [`/schemes/${ids.schemeId}`, `/revisions/${ids.certifiedId}`]) {
        expect(await status(url)).toBe(200);
        const html = await page.content();
        expect(html).not.toContain(ids.draftId);
        expect(await page.getByText(/draft/i).count()).toBe(0);
      }
      const json = await page.evaluate(async (id) => (await fetch(`/api/schemes/${id}`)).text(), ids.schemeId);
      expect(json).not.toContain(ids.draftId);
      expect(json).toContain('"openDraft":null');
    } finally {
      await browser.close();
    }
  });
});
