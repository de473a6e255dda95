import { createServer } from 'node:net';
import { afterAll, beforeAll, expect } from 'vitest';
import { auditTrailView } from '@/lib/audit/audit-trail-view';
import { signIn } from '@/lib/auth/sign-in';
import { signOut } from '@/lib/auth/sign-out';
import { changeUserRole } from '@/lib/users/change-user-role';
import { inviteUser } from '@/lib/users/invite-user';
import { appendEventAt } from './audit-fixtures';
import { createTestScheme } from './scheme-factory';
import { callRoute } from './scheme-requests';
import { signedInAs } from './session-double';
import { useTestDatabase } from './test-database';
import { createTestUser } from './user-factory';

export type Person = Awaited<ReturnType<typeof createTestUser>>;
export const RAFE_CLIENT = '203.0.113.40';

export interface AuditScenario {
  admin: Person;
  rafe: Person;
  formulaDesigner: Person;
  petraAddress: string;
  schemeId: string;
}

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer().listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

const named = async (role: Parameters<typeof createTestUser>[0], name: string) => {
  const person = await createTestUser(role);
  await person.user.update({ name });
  return { ...person, sessionUser: { ...person.sessionUser, name } };
};

/** The trail page's view model for a query, as the page computes it. */
export const view = (query: Record<string, string> = {}) => auditTrailView(query);

/**
 * For one test file: a fresh database whose trail holds a role change (Rafe Calloway, liaison to planning), an
 * invitation, failed sign-ins (wrong password, unknown address), a sign-in and sign-out, and a scheme whose name,
 * reference and designer's name each start a spreadsheet formula.
 */
export function useAuditScenario(): { readonly s: AuditScenario; csvOf: (query?: string) => Promise<Response> } {
  let db: Awaited<ReturnType<typeof useTestDatabase>> | undefined;
  let scenario: AuditScenario | undefined;
  beforeAll(async () => {
    process.env.SMTP_PORT = String(await freePort());
    delete process.env.SMTP_URL;
    db = await useTestDatabase();
    const admin = await named('admin', 'Ida Marchbank');
    const rafe = await named('liaison', 'Rafe Calloway');
    const formulaDesigner = await named('designer', '=HYPERLINK("http://evil.test","Quill")');
    const { scheme } = await createTestScheme(formulaDesigner.user.id);
    await scheme.update({ name: '+Wendle sluice', reference: '@SM-EVIL' });
    await appendEventAt('2026-03-01T09:00:00.000Z', { actorId: formulaDesigner.user.id, action: 'scheme.created', entityType: 'scheme', entityId: scheme.id, schemeId: scheme.id, details: { reference: '@SM-EVIL', name: '+Wendle sluice' } });
    await changeUserRole({ input: { userId: rafe.user.id, role: 'planning' }, admin: admin.sessionUser });
    const petraAddress = `petra.${Date.now()}@wendle-valley.test`;
    await inviteUser({ input: { email: petraAddress, name: 'Petra Quill', role: 'designer' }, admin: admin.sessionUser, baseUrl: 'http://localhost:3000' });
    await expect(signIn({ email: rafe.user.email, password: 'not-his-password', clientAddress: RAFE_CLIENT })).rejects.toMatchObject({ status: 401 });
    await expect(signIn({ email: 'nobody@wendle-valley.test', password: 'whatever', clientAddress: '203.0.113.41' })).rejects.toMatchObject({ status: 401 });
    const signedIn = await signIn({ email: admin.user.email, password: admin.password, clientAddress: '203.0.113.42' });
    await signOut({ sessionId: signedIn.session.id, userId: admin.user.id });
    scenario = { admin, rafe, formulaDesigner, petraAddress, schemeId: scheme.id };
  });
  afterAll(async () => {
    signedInAs(null);
    await db?.cleanup();
  });
  const get = () => {
    if (!scenario) throw new Error('the audit scenario is made in beforeAll: use it inside a hook or a test');
    return scenario;
  };
  return {
    get s() {
      return get();
    },
    csvOf: (query = '') => {
      signedInAs(get().admin.sessionUser);
      return callRoute('admin/audit/csv', 'GET', { query });
    },
  };
}
