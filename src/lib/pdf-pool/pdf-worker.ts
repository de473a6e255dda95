// The entry of each PDF worker thread. Bundled to one plain .mjs file by src/cli/build-pdf-worker.mjs, because
// neither Next's server bundle nor vitest can hand a TypeScript file to a worker thread.
import { move } from 'piscina';
import { renderLetterPdf, renderLettersForPrint } from '@/lib/letters/render-letter-pdf';
import { renderCalculationSheet } from '@/lib/pdf/calculation-sheet';
import { renderCertificatePdf } from '@/lib/pdf/certificate-pdf';
import { createSelfSignedIdentity } from '@/lib/signing/self-signed-identity';
import { signPdf } from '@/lib/signing/sign-pdf';
import type { CreatedIdentity, PdfJob, PdfTask } from './pdf-jobs';

async function pdfOf(job: Exclude<PdfJob, { kind: 'signing-identity' }>): Promise<Buffer> {
  switch (job.kind) {
    case 'certificate':
      return signPdf(await renderCertificatePdf(job.content), job.key, job.signature);
    case 'calculation-sheet':
      return renderCalculationSheet(job.sheet);
    case 'letter':
      return renderLetterPdf(job.letter);
    case 'letters-to-post':
      return renderLettersForPrint(job.letters, job.printedAt);
  }
}

/** The bytes in an ArrayBuffer of their own, which can be transferred: a Buffer may be a view into a shared pool. */
function ownArrayBuffer(bytes: Buffer): ArrayBuffer {
  if (bytes.byteOffset === 0 && bytes.byteLength === bytes.buffer.byteLength && bytes.buffer instanceof ArrayBuffer) return bytes.buffer;
  return new Uint8Array(bytes).buffer;
}

export default async function renderInWorker({ job, started }: PdfTask): Promise<ArrayBuffer | CreatedIdentity> {
  started.postMessage('started');
  started.close();
  if (job.kind === 'signing-identity') return createSelfSignedIdentity(job.passphrase);
  // move() hands the buffer over to the request thread instead of copying it.
  return move(ownArrayBuffer(await pdfOf(job))) as ArrayBuffer;
}
