// The entry of each PDF worker thread. Bundled to one plain .mjs file by src/cli/build-pdf-worker.mjs, because
// neither Next's server bundle nor vitest can hand a TypeScript file to a worker thread.
import { move } from 'piscina';
import { type UploadedCertificateReading, readUploadedCertificate } from '@/lib/certificates/read-uploaded-certificate';
import { renderLetterPdf, renderLettersForPrint } from '@/lib/letters/render-letter-pdf';
import { renderCalculationSheet } from '@/lib/pdf/calculation-sheet';
import { renderCertificatePdf } from '@/lib/pdf/certificate-pdf';
import { createSelfSignedIdentity } from '@/lib/signing/self-signed-identity';
import { signPdf } from '@/lib/signing/sign-pdf';
import { ownArrayBuffer } from '@/lib/worker-pool/own-array-buffer';
import { startedWork } from '@/lib/worker-pool/start-signal';
import type { CreatedIdentity, PdfJob, PdfTask } from './pdf-jobs';

type PdfMaking = Exclude<PdfJob, { kind: 'signing-identity' | 'uploaded-certificate' }>;

async function pdfOf(job: PdfMaking): Promise<Buffer> {
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

export default async function renderInWorker(task: PdfTask): Promise<ArrayBuffer | CreatedIdentity | UploadedCertificateReading> {
  startedWork(task);
  const { job } = task;
  if (job.kind === 'signing-identity') return createSelfSignedIdentity(job.passphrase);
  if (job.kind === 'uploaded-certificate') return readUploadedCertificate(Buffer.from(job.pdf));
  // move() hands the buffer over to the request thread instead of copying it.
  return move(ownArrayBuffer(await pdfOf(job))) as ArrayBuffer;
}
