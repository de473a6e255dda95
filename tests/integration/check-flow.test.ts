import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addReviewCommentAction, countersignRevisionAction, returnRevisionAction } from '@/app/(portal)/checks/[id]/actions';
import { submitForCheckAction } from '@/app/(portal)/revisions/[id]/actions';
import { AuditEvent, Certificate, OutboxMessage, Review, ReviewComment, Revision } from '@/lib/db';
import { ENGINE_VERSION } from '@/lib/hydraulics/version';
import { frozenCaseFile, inputsSha256, resultsSha256 } from '@/lib/revisions/revision-hashes';
import { checkPdfSignature } from '@/lib/signing/check-pdf-signature';
import { signingIdentity } from '@/lib/signing/signing-identity';
import { readCertificateFile } from '@/lib/certificates/certificate-files';
import { createDraftRevision, createTestScheme, demoCase } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

async function ok<T>(result: Promise<{ ok: true; data: T } | { ok: false; status: number; error: string }>): Promise<T> {
  const settled = await result;
  if (!settled.ok) throw new Error(`expected success, got ${settled.status}: ${settled.error}`);
  return settled.data;
}

describe('submit, return, revise, resubmit, countersign', () => {
  it('walks a scheme from draft to an issued, signed certificate, and a later certificate supersedes it', async () => {
    const designer = await createTestUser('designer');
    const checker = await createTestUser('checker');
    const { scheme, revision } = await createTestScheme(designer.user.id);

    signedInAs(designer.sessionUser);
    const submitted = await ok(submitForCheckAction({ revisionId: revision.id, checkerId: checker.user.id }));
    expect(submitted).toMatchObject({ status: 'submitted', checkerId: checker.user.id, queue: false });
    const frozen = await Revision.findByPk(revision.id);
    expect(frozen).toMatchObject({ status: 'submitted', engineVersion: ENGINE_VERSION, checkerId: checker.user.id });
    expect(frozen!.inputsSha256).toBe(inputsSha256(frozenCaseFile(frozen!.inputsJson)));
    expect(frozen!.resultsSha256).toBe(resultsSha256(JSON.parse(frozen!.resultsJson!)));
    expect(frozen!.revisionSha256).toMatch(/^[0-9a-f]{64}$/);
    expect(await OutboxMessage.count({ where: { envelopeTo: checker.user.email } })).toBe(1);

    signedInAs(checker.sessionUser);
    await ok(addReviewCommentAction({ revisionId: revision.id, part: 'structure', body: 'The crest length looks short for the 1% AEP flood; please justify it.' }));
    await ok(returnRevisionAction({ revisionId: revision.id, summary: 'Justify the crest length, or lengthen the crest.' }));
    expect((await Revision.findByPk(revision.id))!.status).toBe('returned');
    expect(await ReviewComment.count()).toBe(1);
    expect(await OutboxMessage.count({ where: { envelopeTo: designer.user.email } })).toBe(1);

    const lengthened = demoCase(undefined, (c) => ((c.control as { crestLength: number }).crestLength = 12));
    const second = await createDraftRevision({ schemeId: scheme.id, authorId: designer.user.id, number: 2, inputs: lengthened, basedOnRevisionId: revision.id });
    signedInAs(designer.sessionUser);
    await ok(submitForCheckAction({ revisionId: second.id, checkerId: '' }));
    expect((await Revision.findByPk(second.id))!.checkerId).toBeNull();

    signedInAs(checker.sessionUser);
    const countersigned = await ok(countersignRevisionAction({ revisionId: second.id, password: checker.password, confirmed: true }));
    expect(countersigned.certificateNumber).toMatch(/^SMC-\d{4}-0001$/);
    const certificate = (await Certificate.findByPk(countersigned.certificateId))!;
    expect(certificate.status).toBe('issued');
    expect((await Revision.findByPk(second.id))).toMatchObject({ status: 'countersigned', checkerId: checker.user.id });
    expect(await Review.findOne({ where: { revisionId: second.id } })).toMatchObject({ decision: 'countersigned', rerunMatches: true });

    const pdf = await readCertificateFile(certificate.pdfPath);
    const signature = checkPdfSignature(pdf);
    expect(signature).toMatchObject({ present: true, valid: true, coversWholeDocument: true, signerFingerprint: (await signingIdentity()).fingerprint });

    const third = await createDraftRevision({ schemeId: scheme.id, authorId: designer.user.id, number: 3, inputs: lengthened, basedOnRevisionId: second.id });
    signedInAs(designer.sessionUser);
    await ok(submitForCheckAction({ revisionId: third.id, checkerId: checker.user.id }));
    signedInAs(checker.sessionUser);
    const later = await ok(countersignRevisionAction({ revisionId: third.id, password: checker.password, confirmed: true }));
    expect(later.superseded).toEqual([certificate.number]);
    expect(await Certificate.findByPk(certificate.id)).toMatchObject({ status: 'superseded', supersededById: later.certificateId });

    const actions = (await AuditEvent.findAll({ where: { schemeId: scheme.id }, order: [['id', 'ASC']] })).map((e) => e.action);
    expect(actions).toEqual([
      'revision.submitted', 'review.started', 'review.commented', 'revision.returned',
      'revision.submitted', 'review.started', 'revision.countersigned', 'certificate.issued',
      'revision.submitted', 'review.started', 'revision.countersigned', 'certificate.superseded', 'certificate.issued',
    ]);
  });
});
