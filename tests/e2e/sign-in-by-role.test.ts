import { describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { seriousAccessibilityViolations } from './support/accessibility';
import { signInAs } from './support/browser';
import { useServedPortal } from './support/served-portal';

const ROLE_HOME_HEADING: Record<string, string> = {
  designer: 'Drafts and returned revisions',
  checker: 'Checks to do',
  liaison: 'Certified revisions with landowners to inform',
  planning: 'Certificates to download',
  admin: 'Invitations not yet accepted',
};

const portal = useServedPortal();



describe('each demo role signs in and sees its own home', () => {
  for (const user of DEMO_USERS) {
    it(`${user.role} sees the ${user.role} home and is refused another role's page`, async () => {
      const context = await portal.browser.newContext();
      const page = await context.newPage();
      await signInAs(page, portal.app.baseUrl, user.email, user.password);
      expect(await page.getByRole('heading', { level: 2, name: ROLE_HOME_HEADING[user.role] }).count()).toBe(1);
      expect(await page.getByTestId('current-role').textContent()).toMatch(new RegExp(user.role === 'planning' ? 'Planning officer' : user.role, 'i'));
      await page.screenshot({ path: `tests/.artifacts/home-${user.role}.png`, fullPage: true });
      expect(await seriousAccessibilityViolations(page)).toEqual([]);

      const otherPage = user.role === 'admin' ? '/home' : '/admin/users';
      const response = await page.goto(`${portal.app.baseUrl}${otherPage}`);
      if (user.role === 'admin') {
        expect(response?.status()).toBe(200);
        for (const adminPage of ['/admin/users', '/admin/audit', '/schemes']) {
          await page.goto(`${portal.app.baseUrl}${adminPage}`);
          expect(await seriousAccessibilityViolations(page), adminPage).toEqual([]);
        }
      } else {
        expect(response?.status()).toBe(403);
        expect(await page.getByRole('heading', { name: 'This page belongs to another role' }).count()).toBe(1);
      }
      await context.close();
    });
  }

  it('shows a clear message for a wrong password and stays on the sign-in page', async () => {
    const context = await portal.browser.newContext();
    const page = await context.newPage();
    await page.goto(`${portal.app.baseUrl}/sign-in`);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.getByLabel('E-mail address').fill('designer@sillmark.test');
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    const failure = page.locator('#sign-in-failure');
    await failure.waitFor();
    expect(await failure.textContent()).toContain('do not match an active account');
    expect(page.url()).toContain('/sign-in');
    await context.close();
  });

  it('sends an anonymous visitor of a portal page to sign in', async () => {
    const context = await portal.browser.newContext();
    const page = await context.newPage();
    await page.goto(`${portal.app.baseUrl}/schemes`);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await context.close();
  });
});
