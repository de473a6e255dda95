import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Certificate, Revision, User, database } from '@/lib/db';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { frozenIntegrity } from '@/lib/revisions/frozen-integrity';
import { frozenCaseFile } from '@/lib/revisions/revision-hashes';
import { readableRevisionWhere } from '@/lib/schemes/revision-visibility';
import { findVisibleRevision } from './find-visible-revision';
import { listAvailableCheckers } from './list-available-checkers';
import { listReviewComments } from './list-review-comments';
import { listSchemeHistory } from './list-scheme-history';

/** Everything the read-only revision page shows: inputs, results, reviews, certificate, the scheme's history. */
export async function loadRevisionView({ revisionId, user }: { revisionId: string; user: SessionUser }) {
  database();
  const { revision, scheme } = await findVisibleRevision(user, revisionId);
  const people = new Map((await User.findAll({ where: { id: [revision.authorId, revision.checkerId].filter((id): id is string => !!id) }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]));
  const ownScheme = user.role === 'designer' && scheme.designerId === user.id;
  const canSubmit = ownScheme && revision.status === 'draft';
  const siblings = await Revision.findAll({ where: { schemeId: scheme.id, ...readableRevisionWhere(user) }, attributes: ['id', 'number', 'status'], order: [['number', 'ASC']] });
  const certificate = await Certificate.findOne({ where: { revisionId: revision.id } });
  return {
    revision: {
      id: revision.id,
      number: revision.number,
      status: revision.status,
      author: people.get(revision.authorId) ?? 'unknown',
      checker: revision.checkerId ? (people.get(revision.checkerId) ?? 'unknown') : null,
      submittedAt: revision.submittedAt,
      countersignedAt: revision.countersignedAt,
      engineVersion: revision.engineVersion,
      inputsSha256: revision.inputsSha256,
      resultsSha256: revision.resultsSha256,
      revisionSha256: revision.revisionSha256,
    },
    scheme: { id: scheme.id, reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site },
    /** Null for a draft; otherwise the hashes recomputed now, with what disagrees. */
    integrity: frozenIntegrity(revision),
    inputs: frozenCaseFile(revision.inputsJson),
    results: revision.resultsJson ? (JSON.parse(revision.resultsJson) as CaseResult) : null,
    reviews: await listReviewComments(revision.id, { includeOpen: user.role === 'checker' || user.role === 'admin' }),
    certificate: certificate ? { id: certificate.id, number: certificate.number, status: certificate.status, issuedAt: certificate.issuedAt } : null,
    history: await listSchemeHistory(scheme.id, { onlyRevisionIds: user.role === 'planning' ? siblings.map((s) => s.id) : null }),
    siblings: siblings.map((s) => ({ id: s.id, number: s.number, status: s.status })),
    canSubmit,
    checkers: canSubmit ? await listAvailableCheckers(revision.authorId) : [],
  };
}
export type RevisionView = Awaited<ReturnType<typeof loadRevisionView>>;
