import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as verifyUpload } from '@/app/api/certificates/verification/route';
import { readCertificateFile } from '@/lib/certificates/certificate-files';
import type { Certificate } from '@/lib/db';
import { locatePdfSignature } from '@/lib/signing/pdf-signature';
import type { PdfVerification } from '@/lib/certificates/verify-certificate-pdf';
import { createCertifiedScheme } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let certificate: Certificate;
let signed: Buffer;
let tampered: Buffer;
const folder = mkdtempSync(path.join(tmpdir(), 'sillmark-pdfsig-'));

beforeAll(async () => {
  db = await useTestDatabase();
  const designer = await createTestUser('designer');
  const checker = await createTestUser('checker');
  ({ certificate } = await createCertifiedScheme({ designer, checker }));
  signed = await readCertificateFile(certificate.pdfPath);
  // One byte changed inside the first signed range, in the middle of the page content.
  const [, firstLength] = locatePdfSignature(signed)!.byteRange;
  tampered = Buffer.from(signed);
  const at = Math.floor(firstLength / 2);
  tampered[at] = tampered[at] === 0x41 ? 0x42 : 0x41;
  signedInAs((await createTestUser('planning')).sessionUser);
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

function pdfsig(pdf: Buffer, name: string): string {
  const file = path.join(folder, name);
  writeFileSync(file, pdf);
  const run = spawnSync('/usr/bin/pdfsig', ['-nocert', file], { encoding: 'utf8' });
  return `${run.stdout}\n${run.stderr}`;
}

async function verify(pdf: Buffer): Promise<PdfVerification> {
  const form = new FormData();
  form.append('file', new Blob([new Uint8Array(pdf)], { type: 'application/pdf' }), 'certificate.pdf');
  const response = await verifyUpload(new Request('http://localhost/api/certificates/verification', { method: 'POST', body: form }), { params: Promise.resolve({}) });
  expect(response.status).toBe(200);
  return (await response.json()) as PdfVerification;
}

describe('the signed certificate, checked by an outside verifier and by the portal', () => {
  it('pdfsig finds one valid signature that covers the whole document', () => {
    const output = pdfsig(signed, 'signed.pdf');
    expect(output).toContain('Signature is Valid.');
    expect(output).toContain('Total document signed');
    expect(output).toContain('adbe.pkcs7.detached');
    expect(output.match(/Signature #/g)).toHaveLength(1);
  });

  it('pdfsig rejects the certificate with one changed byte', () => {
    const output = pdfsig(tampered, 'tampered.pdf');
    expect(output).not.toContain('Signature is Valid.');
    expect(output).toMatch(/Digest Mismatch|Signature is Invalid/);
  });

  it('the portal’s verification accepts the issued file: valid signature by the portal, unaltered, current', async () => {
    const report = await verify(signed);
    expect(report).toMatchObject({ signaturePresent: true, signatureValid: true, coversWholeDocument: true, signedByPortal: true, unaltered: true, current: true, authentic: true, problems: [] });
    expect(report.certificate?.number).toBe(certificate.number);
  });

  it('the portal’s verification rejects the file with one changed byte and says why', async () => {
    const report = await verify(tampered);
    expect(report).toMatchObject({ signatureValid: false, unaltered: false, authentic: false });
    expect(report.problems.join(' ')).toMatch(/altered/);
    expect(report.claimedNumber).toBe(certificate.number);
  });

  it('refuses a file that is not a PDF signature at all, naming the field', async () => {
    const report = await verify(Buffer.from('%PDF-1.3\nnot really a certificate\n'));
    expect(report).toMatchObject({ signaturePresent: false, authentic: false });
    const empty = new FormData();
    const response = await verifyUpload(new Request('http://localhost/api/certificates/verification', { method: 'POST', body: empty }), { params: Promise.resolve({}) });
    expect(response.status).toBe(400);
    expect(await response.json()).toMatchObject({ issues: [{ path: 'file' }] });
  });
});
