import { afterAll, beforeAll, bench, describe } from 'vitest';
import { draftCertificate } from '@/lib/certificates/certificate-draft';
import { issueCertificate } from '@/lib/certificates/issue-certificate';
import { signCertificate } from '@/lib/certificates/sign-certificate';
import { removeCertificateFile } from '@/lib/certificates/certificate-files';
import { readSnapshot } from '@/lib/db/read-snapshot';
import { type Revision, type Scheme, type User, database } from '@/lib/db';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CertificateContent } from '@/lib/pdf/certificate-content';
import { renderCertificatePdf } from '@/lib/pdf/certificate-pdf';
import { frozenCaseFile } from '@/lib/revisions/revision-hashes';
import { signPdf } from '@/lib/signing/sign-pdf';
import { type SigningIdentity, signingIdentity } from '@/lib/signing/signing-identity';
import { parseCase } from '@/lib/validation/parse-case';
import { createTestRevision, createTestScheme } from '../integration/support/liaison-fixtures';
import { useTestDatabase } from '../integration/support/test-database';
import { createTestUser } from '../integration/support/user-factory';
import { machineDescription } from './machine';

// One certificate for a countersigned revision of the demo case (db/seeds/cases/wendle-harrowfield-broad-crested.json,
// results by the engine), over a SQLite file in a temp folder. Each task runs exactly `iterations` times after one warm-up.

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let people: { scheme: Scheme; revision: Revision; designer: User; checker: User };
let content: CertificateContent;
let unsigned: Buffer;
let identity: SigningIdentity;

function certificateContent(revision: Revision, scheme: Scheme): CertificateContent {
  const parsed = parseCase(frozenCaseFile(revision.inputsJson));
  if (!parsed.ok || !revision.resultsJson) throw new Error('the demo revision has no frozen inputs and results');
  const person = (name: string, role: string) => ({ name, organisation: 'Wendle Valley Drainage Board', role, act: `${role} on 2026-03-14 09:30 UTC.` });
  return {
    number: 'SM-2026-0001',
    issuedAt: new Date().toISOString(),
    scheme: { reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site },
    revision: { number: revision.number, engineVersion: revision.engineVersion ?? '', revisionSha256: revision.revisionSha256 ?? '', inputsSha256: revision.inputsSha256 ?? '', resultsSha256: revision.resultsSha256 ?? '' },
    designer: person('Bench designer', 'Designer'),
    checker: person('Bench checker', 'Checker'),
    datum: 'Ordnance Datum Newlyn',
    inputs: parsed.value,
    results: JSON.parse(revision.resultsJson) as CaseResult,
    verificationUrl: 'http://localhost:3000/verify?number=SM-2026-0001',
    signingCertificateUrl: 'http://localhost:3000/api/signing-certificate',
  };
}

beforeAll(async () => {
  console.log(`Machine: ${machineDescription()}`);
  db = await useTestDatabase();
  const designer = (await createTestUser('designer')).user;
  const checker = (await createTestUser('checker')).user;
  const scheme = await createTestScheme(designer.id);
  const revision = await createTestRevision({ schemeId: scheme.id, authorId: designer.id, checkerId: checker.id, status: 'countersigned' });
  people = { scheme, revision, designer, checker };
  content = certificateContent(revision, scheme);
  unsigned = await renderCertificatePdf(content);
  identity = await signingIdentity();
});
afterAll(async () => db.cleanup());

const once = { iterations: 10, time: 0, warmupIterations: 1, warmupTime: 0 };

describe('certificate PDF (demo case, one countersigned revision)', () => {
  bench('render: pdfkit, embedded fonts, long-section, tables, QR code', async () => {
    await renderCertificatePdf(content);
  }, once);

  bench('sign: detached PKCS#7 (RSA 2048) over the rendered PDF', async () => {
    await signPdf(unsigned, identity, { reason: 'Sillmark benchmark', location: 'River Wendle at Harrowfield Mill', contactInfo: content.verificationUrl });
  }, once);

  bench('issue: render and sign on the PDF pool, store the file and record the row and audit event (rolled back)', async () => {
    const baseUrl = 'http://localhost:3000';
    const signed = await signCertificate(await readSnapshot((transaction) => draftCertificate(people, { issuedAt: new Date().toISOString(), baseUrl, transaction })));
    const transaction = await database().transaction();
    let written: string | null = null;
    try {
      await issueCertificate({ parties: people, signed, baseUrl, transaction, onFileWritten: (file) => (written = file) });
    } finally {
      await transaction.rollback();
      if (written) await removeCertificateFile(written);
    }
  }, once);
});
