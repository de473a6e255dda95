// @vitest-environment jsdom
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { SWRConfig } from 'swr';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import type { PdfVerification } from '@/lib/certificates/verify-certificate-pdf';
import { VerifyUploadForm } from '@/app/verify/verify-upload-form';

// jsdom's File loses its name on the way through the fetch body, so the handler tells the cases apart by size.
const AUTHENTIC = 2048;
const TAMPERED = 2049;
const REFUSED = 2050;
const uploads: number[] = [];
const authentic: PdfVerification = {
  signaturePresent: true, signatureValid: true, coversWholeDocument: true, signedByPortal: true, unaltered: true, current: true, authentic: true, problems: [], claimedNumber: null, sha256: 'ab'.repeat(32),
  certificate: { id: 'c1', number: 'SMC-2026-0007', status: 'issued', issuedAt: '2026-03-15T10:00:00.000Z', pdfSha256: 'ab'.repeat(32), signerFingerprint: 'cd'.repeat(32), scheme: { reference: 'SM-0001', name: 'Harrowfield Mill weir renewal', watercourse: 'River Wendle', site: 'Harrowfield Mill' }, revision: { number: 2, revisionSha256: 'ef'.repeat(32), countersignedAt: '2026-03-15T10:00:00.000Z' }, supersededBy: null, revokedAt: null, revocationReason: null },
};
const server = setupServer(
  http.post('*/api/certificates/verification', async ({ request }) => {
    const file = (await request.formData()).get('file') as Blob;
    uploads.push(file.size);
    if (file.size === TAMPERED) return HttpResponse.json({ ...authentic, signatureValid: false, unaltered: false, authentic: false, problems: ['The document’s bytes do not match the digest that was signed: the file has been altered.'] });
    if (file.size === REFUSED) return HttpResponse.json({ error: 'Some fields need attention.', issues: [{ path: 'file', message: 'The file is larger than 5 MB; a Sillmark certificate is far smaller.' }] }, { status: 413 });
    return HttpResponse.json(authentic);
  }),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  uploads.length = 0;
});
afterAll(() => server.close());

function renderForm() {
  // A fresh SWR cache for each test, so no result leaks from one test into the next.
  return render(<SWRConfig value={{ provider: () => new Map() }}><VerifyUploadForm /></SWRConfig>);
}

const pdf = (name: string, size: number) => new File([new Uint8Array(size)], name, { type: 'application/pdf' });

describe('the certificate upload form', () => {
  it('reports an authentic, current certificate point by point', async () => {
    renderForm();
    await userEvent.upload(screen.getByLabelText('Certificate PDF'), pdf('SMC-2026-0007.pdf', AUTHENTIC));
    await userEvent.click(screen.getByRole('button', { name: 'Check the PDF' }));
    expect(await screen.findByText(/Authentic and current/)).toBeTruthy();
    expect(screen.getByText(/The digital signature is valid: yes/)).toBeTruthy();
    expect(screen.getByText('SMC-2026-0007')).toBeTruthy();
    expect(uploads).toEqual([AUTHENTIC]);
  });

  it('says plainly why an altered file is not verified', async () => {
    renderForm();
    await userEvent.upload(screen.getByLabelText('Certificate PDF'), pdf('tampered.pdf', TAMPERED));
    await userEvent.click(screen.getByRole('button', { name: 'Check the PDF' }));
    expect(await screen.findByText(/Not verified: do not rely on this file/)).toBeTruthy();
    expect(screen.getByText(/The file is unaltered \(identical to the one issued\): no/)).toBeTruthy();
    expect(screen.getByText(/the file has been altered/)).toBeTruthy();
  });

  it('refuses an empty file at the field without sending it', async () => {
    renderForm();
    await userEvent.upload(screen.getByLabelText('Certificate PDF'), pdf('empty.pdf', 0));
    await userEvent.click(screen.getByRole('button', { name: 'Check the PDF' }));
    expect((await screen.findByRole('alert')).textContent).toContain('The chosen file is empty (0 bytes).');
    expect(uploads).toEqual([]);
  });

  it('shows the server’s refusal at the field', async () => {
    renderForm();
    await userEvent.upload(screen.getByLabelText('Certificate PDF'), pdf('refused.pdf', REFUSED));
    await userEvent.click(screen.getByRole('button', { name: 'Check the PDF' }));
    expect((await screen.findByRole('alert')).textContent).toContain('larger than 5 MB');
    expect(screen.getByLabelText('Certificate PDF').getAttribute('aria-invalid')).toBe('true');
  });
});
