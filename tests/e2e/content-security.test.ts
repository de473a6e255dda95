import type { BrowserContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { signInAs } from './support/browser';
import { useServedPortal } from './support/served-portal';
import { canvasInk } from './support/wizard-helpers';

// Issue 14 §9: every page loads under the Content-Security-Policy with nothing refused, and the headers and the
// session cookie are what the README says.

const portal = useServedPortal();
const person = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

/** A context that records every policy violation the browser reports, as an event or on the console. */
async function watchedContext(): Promise<{ context: BrowserContext; page: Page; violations: string[] }> {
  const context = await portal.browser.newContext({ viewport: { width: 1280, height: 900 } });
  const violations: string[] = [];
  await context.exposeBinding('reportPolicyViolation', (_source, text: string) => void violations.push(text));
  await context.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (event) => {
      (window as unknown as { reportPolicyViolation: (text: string) => void }).reportPolicyViolation(`${event.violatedDirective} refused ${event.blockedURI || 'inline'} on ${location.pathname}`);
    });
  });
  const page = await context.newPage();
  page.on('console', (message) => {
    if (/Content Security Policy|Refused to (load|execute|apply|connect|frame)/i.test(message.text())) violations.push(message.text());
  });
  return { context, page, violations };
}

async function demoSchemePath(page: Page): Promise<string> {
  await page.goto(`${portal.app.baseUrl}/schemes`);
  const href = await page.getByRole('link', { name: /Harrowfield Mill weir renewal/ }).first().getAttribute('href');
  expect(href).toMatch(/^\/schemes\/[0-9a-f-]+$/);
  return href!;
}

describe('the Content-Security-Policy', () => {
  it('gives each page a fresh nonce, carried by its scripts, and allows no inline script', async () => {
    const first = await fetch(`${portal.app.baseUrl}/sign-in`);
    const second = await fetch(`${portal.app.baseUrl}/sign-in`);
    const policy = first.headers.get('content-security-policy') ?? '';
    const scriptSrc = policy.split(';').map((d) => d.trim()).find((d) => d.startsWith('script-src')) ?? '';
    const nonce = /'nonce-([^']+)'/.exec(scriptSrc)?.[1];
    expect(nonce).toBeTruthy();
    expect(scriptSrc).not.toContain("'unsafe-inline'");
    expect(scriptSrc).not.toContain("'unsafe-eval'");
    expect(policy).toContain("object-src 'none'");
    expect(policy).toContain("frame-ancestors 'none'");
    expect(second.headers.get('content-security-policy')).not.toContain(nonce);
    const html = await first.text();
    const scripts = html.match(/<script\b[^>]*>/g) ?? [];
    expect(scripts.length).toBeGreaterThan(0);
    for (const script of scripts) expect(script).toContain(`nonce="${nonce}"`);
    expect(first.headers.get('permissions-policy')).toContain('camera=()');
    // Served over plain HTTP on loopback: no HSTS (the integration test covers HTTPS).
    expect(first.headers.get('strict-transport-security')).toBeNull();
  });

  it('reports no violation on sign-in, a results sheet with its charts, and the wizard', async () => {
    const { context, page, violations } = await watchedContext();
    try {
      const designer = person('designer');
      await signInAs(page, portal.app.baseUrl, designer.email, designer.password);
      const scheme = await demoSchemePath(page);

      await page.goto(`${portal.app.baseUrl}${scheme}/results`);
      const chart = await canvasInk(page, '[data-testid="long-section-chart"]');
      expect(chart.inked, 'the long-section chart is drawn, so its scripts ran').toBeGreaterThan(0);

      await page.goto(`${portal.app.baseUrl}${scheme}/wizard/channel`);
      const drawing = await canvasInk(page, 'canvas');
      expect(drawing.inked, 'the wizard’s drawing is drawn, so its scripts ran').toBeGreaterThan(0);
      await page.screenshot({ path: 'tests/.artifacts/content-security-wizard.png', fullPage: true });
      expect(violations).toEqual([]);
    } finally {
      await context.close();
    }
  });
});

describe('personal and admin data, and the session cookie', () => {
  it('are never stored by a cache, and the cookie ends with the twelve-hour session', async () => {
    const { context, page } = await watchedContext();
    try {
      const liaison = person('liaison');
      await signInAs(page, portal.app.baseUrl, liaison.email, liaison.password);
      const cookie = (await context.cookies()).find((c) => c.name === 'sillmark_session');
      const hoursLeft = ((cookie?.expires ?? 0) - Date.now() / 1000) / 3600;
      expect(hoursLeft).toBeGreaterThan(11.9);
      expect(hoursLeft).toBeLessThanOrEqual(12);

      const scheme = await demoSchemePath(page);
      const schemeId = scheme.split('/').pop();
      const parcels = await context.request.get(`${portal.app.baseUrl}/api/parcels/${schemeId}`);
      expect(parcels.status()).toBe(200);
      expect(parcels.headers()['cache-control']).toContain('no-store');
      const register = await context.request.get(`${portal.app.baseUrl}/liaison/${schemeId}/register`);
      expect(register.headers()['cache-control']).toContain('no-store');
    } finally {
      await context.close();
    }
    const { context: adminContext, page: adminPage } = await watchedContext();
    try {
      const admin = person('admin');
      await signInAs(adminPage, portal.app.baseUrl, admin.email, admin.password);
      const users = await adminContext.request.get(`${portal.app.baseUrl}/api/admin/users`);
      expect(users.status()).toBe(200);
      expect(users.headers()['cache-control']).toContain('no-store');
    } finally {
      await adminContext.close();
    }
  });
});
