import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { revokeCertificateAction } from '@/app/(portal)/admin/certificates/actions';
import { GET as downloadPdf } from '@/app/api/certificates/[id]/pdf/route';
import { GET as listRegister } from '@/app/api/certificates/route';
import { GET as signingCertificate } from '@/app/api/signing-certificate/route';
import type { CertificateRegister } from '@/lib/certificates/list-certificates';
import { lookupCertificate } from '@/lib/certificates/lookup-certificate';
import { verifyCertificatePdf } from '@/lib/certificates/verify-certificate-pdf';
import { AuditEvent, type Certificate, type Scheme } from '@/lib/db';
import { sha256Hex } from '@/lib/revisions/revision-hashes';
import { signingIdentity } from '@/lib/signing/signing-identity';
import { createCertifiedScheme } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Person;
let planning: Person;
let admin: Person;
const certified: { scheme: Scheme; certificate: Certificate }[] = [];

beforeAll(async () => {
  db = await useTestDatabase();
  designer = await createTestUser('designer');
  planning = await createTestUser('planning');
  admin = await createTestUser('admin');
  const checker = await createTestUser('checker');
  for (let i = 0; i < 3; i++) certified.push(await createCertifiedScheme({ designer, checker }));
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const download = (id: string) => downloadPdf(new Request(`http://localhost/api/certificates/${id}/pdf`), { params: Promise.resolve({ id }) });
const register = async (query: string) => (await (await listRegister(new Request(`http://localhost/api/certificates?${query}`), { params: Promise.resolve({}) })).json()) as CertificateRegister;

describe('downloading a certificate', () => {
  it('gives the planning officer the signed PDF exactly as issued and records the download', async () => {
    const { certificate, scheme } = certified[0];
    signedInAs(planning.sessionUser);
    const response = await download(certificate.id);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/pdf');
    const bytes = Buffer.from(await response.arrayBuffer());
    expect(sha256Hex(bytes)).toBe(certificate.pdfSha256);
    expect(await AuditEvent.findOne({ where: { action: 'certificate.downloaded', entityId: certificate.id, actorId: planning.user.id, schemeId: scheme.id } })).not.toBeNull();
  });

  it('hides another designer’s certificate (404)', async () => {
    signedInAs((await createTestUser('designer')).sessionUser);
    expect((await download(certified[0].certificate.id)).status).toBe(404);
    signedInAs(designer.sessionUser);
    expect((await download(certified[0].certificate.id)).status).toBe(200);
  });
});

describe('the public signing certificate', () => {
  it('is the identity that signs the certificates', async () => {
    signedInAs(null);
    const response = await signingCertificate();
    expect(response.status).toBe(200);
    const pem = await response.text();
    expect(pem).toContain('BEGIN CERTIFICATE');
    expect(response.headers.get('x-certificate-sha256')).toBe(certified[0].certificate.signerFingerprint);
    expect((await signingIdentity()).certificatePem).toBe(pem);
  });
});

describe('the register', () => {
  it('searches by scheme, site and number, filters by status and date, sorts and pages', async () => {
    signedInAs(planning.sessionUser);
    expect((await register('')).total).toBe(3);
    const byReference = await register(`q=${certified[1].scheme.reference}`);
    expect(byReference.certificates.map((c) => c.number)).toEqual([certified[1].certificate.number]);
    expect((await register(`q=${certified[2].certificate.number}`)).total).toBe(1);
    expect((await register('q=Harrowfield Mill')).total).toBe(3);
    expect((await register('q=Nowhere')).total).toBe(0);
    const ascending = await register('sort=number&direction=asc');
    expect(ascending.certificates.map((c) => c.number)).toEqual([...certified.map((c) => c.certificate.number)].sort());
    const today = new Date().toISOString().slice(0, 10);
    expect((await register(`from=${today}&to=${today}`)).total).toBe(3);
    expect((await register('to=2000-01-01')).total).toBe(0);
    expect((await register('page=2')).certificates).toEqual([]);
    const bad = await listRegister(new Request('http://localhost/api/certificates?from=yesterday'), { params: Promise.resolve({}) });
    expect(bad.status).toBe(400);
    expect(await bad.json()).toMatchObject({ issues: [{ path: 'from' }] });
  });
});

describe('revocation', () => {
  it('needs a reason, stores nothing without one, and then shows as revoked everywhere', async () => {
    const { certificate } = certified[2];
    signedInAs(admin.sessionUser);
    const before = await tableSnapshot();
    expect(await revokeCertificateAction({ certificateId: certificate.id, reason: 'oops', confirmed: true, password: admin.password })).toMatchObject({ ok: false, status: 400, issues: [{ path: 'reason' }] });
    expect(await tableSnapshot()).toEqual(before);

    const reason = 'The survey of the Mill Lane bridge soffit was found to be wrong.';
    expect(await revokeCertificateAction({ certificateId: certificate.id, reason, confirmed: true, password: admin.password })).toMatchObject({ ok: true, data: { status: 'revoked' } });
    expect(await lookupCertificate({ number: certificate.number })).toMatchObject({ status: 'revoked', revocationReason: reason });
    expect(await revokeCertificateAction({ certificateId: certificate.id, reason, confirmed: true, password: admin.password })).toMatchObject({ ok: false, status: 409 });

    signedInAs(planning.sessionUser);
    const pdf = Buffer.from(await (await download(certificate.id)).arrayBuffer());
    const report = await verifyCertificatePdf({ pdf });
    expect(report).toMatchObject({ signatureValid: true, unaltered: true, current: false, authentic: false });
    expect(report.problems.join(' ')).toContain(reason);
    expect((await register('status=revoked')).certificates.map((c) => c.number)).toEqual([certificate.number]);
  });
});
