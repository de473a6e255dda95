import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as downloadPdf } from '@/app/api/certificates/[id]/pdf/route';
import { AuditEvent, type Certificate } from '@/lib/db';
import { loadRoleHome } from '@/lib/home/load-role-home';
import { createCertifiedScheme } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let planning: Person;
let certificate: Certificate;

beforeAll(async () => {
  db = await useTestDatabase();
  planning = await createTestUser('planning');
  certificate = (await createCertifiedScheme({ designer: await createTestUser('designer'), checker: await createTestUser('checker') })).certificate;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const download = (headers: Record<string, string> = {}) => downloadPdf(new Request(`http://localhost/api/certificates/${certificate.id}/pdf`, { headers }), { params: Promise.resolve({ id: certificate.id }) });
const downloads = () => AuditEvent.count({ where: { action: 'certificate.downloaded', entityId: certificate.id } });

describe('only a download a person asked for is logged', () => {
  it('links the planning officer’s home to each certificate as a plain file link, not a prefetched page link', async () => {
    const home = await loadRoleHome(planning.sessionUser);
    const item = home.sections[0].items.find((i) => i.id === certificate.id);
    expect(item).toMatchObject({ href: `/api/certificates/${certificate.id}/pdf`, download: true });
    expect(await downloads()).toBe(0);
  });

  for (const [name, headers] of [
    ['Next’s router prefetch', { 'Next-Router-Prefetch': '1' }],
    ['a browser’s Purpose: prefetch', { Purpose: 'prefetch' }],
    ['a browser’s Sec-Purpose: prefetch', { 'Sec-Purpose': 'prefetch;prerender' }],
  ] as const) {
    it(`answers ${name} with no file and logs nothing`, async () => {
      signedInAs(planning.sessionUser);
      const response = await download(headers);
      expect(response.status).toBe(204);
      expect((await response.arrayBuffer()).byteLength).toBe(0);
      expect(await downloads()).toBe(0);
    });
  }

  it('serves the signed PDF to a person and logs that one download', async () => {
    signedInAs(planning.sessionUser);
    const response = await download();
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/pdf');
    expect(await downloads()).toBe(1);
  });
});
