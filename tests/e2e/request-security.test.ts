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

  it('refuses a cross-origin POST that forges X-Forwarded-Host to match its Origin', async () => {
    const response = await fetch(`${app.baseUrl}/sign-in`, { method: 'POST', headers: { origin: 'http://evil.example', 'x-forwarded-host': 'evil.example', host: 'evil.example', 'content-type': 'text/plain' }, body: '[]' });
    expect(response.status).toBe(403);
  });

  it('sends the browser to the portal’s home page, not to another site, after signing in with a crafted next', async () => {
    const browser = await launchBrowser();
    try {
      const page = await browser.newPage();
      const admin = DEMO_USERS.find((u) => u.role === 'admin')!;
      for (const next of ['/%5Cevil.example/landed', '/%09/evil.example/landed']) {
        await page.context().clearCookies();
        await page.goto(`${app.baseUrl}/sign-in?next=${next}`);
        await page.getByLabel('E-mail address').fill(admin.email);
        await page.getByLabel('Password').fill(admin.password);
        await page.getByRole('button', { name: 'Sign in' }).click();
        await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
        expect(page.url()).toBe(`${app.baseUrl}/home`);
      }
    } finally {
      await browser.close();
    }
  });

  it('counts wrong sign-ins by the address on the socket, whatever X-Forwarded-For the client writes', async () => {
    const browser = await launchBrowser();
    try {
      const page = await browser.newPage();
      const planning = DEMO_USERS.find((u) => u.role === 'planning')!;
      const attempt = async (password: string, forwarded: string) => {
        await page.setExtraHTTPHeaders({ 'x-forwarded-for': forwarded });
        await page.goto(`${app.baseUrl}/sign-in`);
        await page.getByLabel('E-mail address').fill(planning.email);
        await page.getByLabel('Password').fill(password);
        await page.getByRole('button', { name: 'Sign in' }).click();
        return (await page.locator('#sign-in-failure').textContent()) ?? '';
      };
      for (let i = 1; i <= 5; i++) expect(await attempt(`wrong-${i}`, `192.0.2.${i}`)).toMatch(/do not match an active account/);
      expect(await attempt(planning.password, '192.0.2.99')).toMatch(/Too many failed sign-ins for this account from this computer/);
    } finally {
      await browser.close();
    }
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
