import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { countersignRevisionAction } from '@/app/(portal)/checks/[id]/actions';
import { submitForCheckAction } from '@/app/(portal)/revisions/[id]/actions';
import { readCertificateFile } from '@/lib/certificates/certificate-files';
import { Certificate, OutboxMessage } from '@/lib/db';
import { createTestScheme } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// Every request in this file claims to come through a proxy for another site.
vi.mock('next/headers', () => ({
  cookies: async () => ({ get: () => undefined, set: () => undefined, delete: () => undefined, has: () => false }),
  headers: async () => new Headers({ host: 'evil.example', 'x-forwarded-host': 'evil.example', 'x-forwarded-proto': 'https' }),
}));

// PUBLIC_URL is not set here, as when the finding was made: links fall back to the loopback default, not the request.
const PUBLIC_URL = 'http://localhost:3000';
let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => {
  delete process.env.PUBLIC_URL;
  delete process.env.PORT;
  db = await useTestDatabase();
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

async function ok<T>(result: Promise<{ ok: true; data: T } | { ok: false; status: number; error: string }>): Promise<T> {
  const settled = await result;
  if (!settled.ok) throw new Error(`expected success, got ${settled.status}: ${settled.error}`);
  return settled.data;
}

describe('links in e-mails, certificates and QR codes', () => {
  it('come from configuration (here the loopback default), never from the Host or X-Forwarded-Host of the request', async () => {
    const designer = await createTestUser('designer');
    const checker = await createTestUser('checker');
    const { revision } = await createTestScheme(designer.user.id);

    signedInAs(designer.sessionUser);
    await ok(submitForCheckAction({ revisionId: revision.id, checkerId: checker.user.id }));
    const waiting = await OutboxMessage.findOne({ where: { envelopeTo: checker.user.email } });
    const mail = await readFile(waiting!.rawPath, 'utf8');
    expect(mail).toContain(`${PUBLIC_URL}/`);
    expect(mail).not.toContain('evil.example');

    signedInAs(checker.sessionUser);
    const countersigned = await ok(countersignRevisionAction({ revisionId: revision.id, password: checker.password, confirmed: true }));
    const pdf = (await readCertificateFile((await Certificate.findByPk(countersigned.certificateId))!.pdfPath)).toString('latin1');
    expect(pdf).toContain(`${PUBLIC_URL}/verify?number=`);
    expect(pdf).not.toContain('evil.example');
  });
});
