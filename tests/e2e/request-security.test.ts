import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { startApp, type RunningApp } from './support/app-server';
import { launchBrowser, signInAs } from './support/browser';

let app: RunningApp;
beforeAll(async () => (app = await startApp()));
afterAll(async () => app?.stop());

describe('requests across origins and sessions', () => {
  it('refuses a cross-origin POST before it reaches a handler or an action', async () => {
    const response = await fetch(`${app.baseUrl}/sign-in`, { method: 'POST', headers: { origin: 'http://elsewhere.example', 'content-type': 'text/plain' }, body: '[]' });
    expect(response.status).toBe(403);
    expect(await response.text()).toMatch(/Cross-origin/);
    const api = await fetch(`${app.baseUrl}/api/admin/users`, { method: 'POST', headers: { origin: 'http://elsewhere.example', 'content-type': 'application/json' }, body: '{}' });
    expect(api.status).toBe(403);
  });

  it('answers API calls without a session with 401 and sets security headers', async () => {
    const response = await fetch(`${app.baseUrl}/api/schemes`);
    expect(response.status).toBe(401);
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(response.headers.get('x-frame-options')).toBe('DENY');
  });

  it('gives a new session id at sign-in (no fixation) and ends it at sign-out', async () => {
    const browser = await launchBrowser();
    try {
      const context = await browser.newContext();
      await context.addCookies([{ name: 'sillmark_session', value: 'planted-by-an-attacker', url: app.baseUrl }]);
      const page = await context.newPage();
      const admin = DEMO_USERS.find((u) => u.role === 'admin')!;
      await signInAs(page, app.baseUrl, admin.email, admin.password);
      const session = (await context.cookies()).find((c) => c.name === 'sillmark_session');
      expect(session?.value).toBeTruthy();
      expect(session?.value).not.toBe('planted-by-an-attacker');
      expect(session?.httpOnly).toBe(true);
      expect(session?.sameSite).toBe('Lax');
      await page.getByRole('button', { name: 'Sign out', exact: true }).click();
      await page.waitForURL(`${app.baseUrl}/sign-in`);
      const reuse = await fetch(`${app.baseUrl}/api/session`, { headers: { cookie: `sillmark_session=${session!.value}` } });
      expect(reuse.status).toBe(401);
    } finally {
      await browser.close();
    }
  });
});
