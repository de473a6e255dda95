import { type Details, type Words, count, plural, text } from './event-details';

const revision = (d: Details, key = 'number') => (typeof d[key] === 'number' ? `revision ${d[key]}` : 'a revision');
const quoted = (value: string | null) => (value ? `“${value}”` : '');
const CREST_FIELDS: Record<string, string> = { 'control.sillHeight': 'sill height above the bed', 'control.crestLength': 'crest length' };

/** Schemes, revisions, the independent check and certificates. */
export const WORK_WORDS: Record<string, Words> = {
  'scheme.created': (_e, d) => `created scheme ${text(d, 'reference') ?? ''} ${quoted(text(d, 'name'))}`.replace(/\s+/g, ' ').trim(),
  'scheme.imported': (_e, d) => `imported scheme ${text(d, 'reference') ?? ''} from the case file ${text(d, 'file') ?? ''}`.replace(/\s+/g, ' ').trim(),
  'demo.seeded': (_e, d) => `loaded the demonstration scheme${count(d, 'users') ? ` and ${plural(count(d, 'users') ?? 0, 'user')}` : ''}`,
  'revision.draft-created': (_e, d) => `started draft ${revision(d)}${typeof d.basedOnRevision === 'number' ? ` from revision ${d.basedOnRevision}` : ''}`,
  'revision.step-saved': (_e, d) => `saved the ${text(d, 'step') ?? ''} step of draft ${revision(d)}${count(d, 'changed') ? ` (${plural(count(d, 'changed') ?? 0, 'value')} changed)` : ''}`,
  'revision.survey-attached': (_e, d) => `attached the survey ${text(d, 'file') ?? 'file'}${count(d, 'sections') ? ` (${plural(count(d, 'sections') ?? 0, 'cross-section')})` : ''} to draft ${revision(d)}`,
  'revision.evaluated': (_e, d) => `ran the hydraulic check on ${revision(d)}: ${d.verdict === 'pass' ? 'within the limits' : d.verdict === 'fail' ? 'outside the limits' : 'no verdict'}`,
  'revision.crest-adopted': (_e, d) => `adopted the sized ${CREST_FIELDS[text(d, 'field') ?? ''] ?? 'crest'} for ${revision(d)}: from ${String(d.from ?? 'none')} to ${String(d.to ?? 'none')} (in the scheme’s units)`,
  'revision.submitted': (_e, d, n) => `submitted ${revision(d)} for check ${text(d, 'checkerId') ? `by ${n.person(text(d, 'checkerId'))}` : 'to the checkers’ queue'}`,
  'review.started': (_e, d) => `started checking ${revision(d)}${d.claimedFromQueue === true ? ', taken from the queue' : ''}`,
  'review.commented': (_e, d) => `commented on the ${text(d, 'part') ?? ''} part of a revision under check`.replace(/\s+/g, ' '),
  'revision.returned': (_e, d) => `returned ${revision(d)} to its designer with ${plural(count(d, 'comments') ?? 0, 'comment')}${text(d, 'summary') ? `: ${quoted(text(d, 'summary'))}` : ''}`,
  'revision.countersigned': (_e, d) => `countersigned ${revision(d)}`,
  'certificate.issued': (_e, d) => `issued certificate ${text(d, 'number') ?? ''} for ${revision(d, 'revisionNumber')}`,
  'certificate.superseded': (_e, d) => `marked certificate ${text(d, 'number') ?? ''} superseded by ${text(d, 'supersededBy') ?? 'a newer one'}`,
  'certificate.revoked': (_e, d) => `revoked certificate ${text(d, 'number') ?? ''}${text(d, 'reason') ? `: ${quoted(text(d, 'reason'))}` : ''}`,
  'certificate.downloaded': (_e, d) => `downloaded certificate ${text(d, 'number') ?? ''}`.trim(),
};
