import { DEFAULT_PARAGRAPHS } from '@/lib/letters/letter-template';
import { readFileSync } from 'node:fs';
import type { Ownership } from './access-matrix';
import type { Person, PortalWorld } from './portal-world';
import { CHANNEL_STEP, STRUCTURE_STEP } from './scheme-requests';

// How to call each owned route and action on a record of the portal world: the draft for scheme-reader and
// scheme-designer, the submitted revision for assigned-checker, the certified scheme for the rest.

export interface RouteCall {
  id?: string;
  query?: string;
  json?: unknown;
  body?: BodyInit;
  headers?: Record<string, string>;
}

const survey = (revisionId: string): RouteCall => ({ query: `revision=${revisionId}`, body: new Uint8Array(readFileSync('db/seeds/surveys/wendle-harrowfield-survey.csv')), headers: { 'content-type': 'text/csv', 'x-file-name': 'survey.csv' } });

export const OWNED_ROUTE_CALLS: Record<string, (w: PortalWorld) => RouteCall> = {
  'GET api/schemes/[id]': (w) => ({ id: w.draft.schemeId }),
  'GET api/schemes/[id]/case-file': (w) => ({ id: w.draft.schemeId }),
  'GET api/schemes/[id]/step-table': (w) => ({ id: w.draft.schemeId }),
  'GET api/schemes/[id]/calculation-sheet': (w) => ({ id: w.draft.schemeId }),
  'GET api/revisions/[id]': (w) => ({ id: w.draft.revisionId }),
  'POST api/evaluate': (w) => ({ json: { revisionId: w.draft.revisionId } }),
  'PUT api/revisions/[id]': (w) => ({ id: w.draft.revisionId, json: { step: 'channel', values: CHANNEL_STEP } }),
  'POST api/head-preview': (w) => ({ json: { revisionId: w.draft.revisionId, control: STRUCTURE_STEP.control } }),
  'POST api/uploads/survey': (w) => survey(w.draft.revisionId),
  'POST api/uploads/survey-preview': (w) => survey(w.draft.revisionId),
  'GET api/certificates/[id]/pdf': (w) => ({ id: w.certified.certificateId }),
  'GET api/parcels/[id]': (w) => ({ id: w.certified.schemeId }),
  'GET api/parcels/[id]/impact': (w) => ({ id: w.certified.schemeId }),
  'GET api/parcels/[id]/export': (w) => ({ id: w.certified.schemeId, query: 'table=tracking' }),
  'GET api/letters/[id]': (w) => ({ id: w.letters.letterId }),
  'GET api/letters/batches/[id]': (w) => ({ id: w.letters.batchId }),
};

/** Inputs of the owned actions; `who` is the caller (countersigning asks for the caller's own password). */
export const OWNED_ACTION_CALLS: Record<string, (w: PortalWorld, who: Person) => unknown> = {
  '(portal)/revisions/[id] submitForCheckAction': (w) => ({ revisionId: w.draft.revisionId, checkerId: '' }),
  '(portal)/schemes/[id] startDraftAction': (w) => ({ revisionId: w.draft.revisionId }),
  '(portal)/schemes/[id] adoptSizedCrestAction': (w) => ({ revisionId: w.draft.revisionId }),
  '(portal)/checks/[id] addReviewCommentAction': (w) => ({ revisionId: w.submitted.revisionId, part: 'results', body: 'Please justify the roughness upstream.' }),
  '(portal)/checks/[id] returnRevisionAction': (w) => ({ revisionId: w.submitted.revisionId, summary: 'Justify Manning’s n for the upper reach.' }),
  '(portal)/liaison/[id]/template previewLetterAction': (w) => ({ schemeId: w.certified.schemeId, responseDays: 28, parcelReference: 'HM-02', ...DEFAULT_PARAGRAPHS }),
  '(portal)/checks/[id] countersignRevisionAction': (w, who) => ({ revisionId: w.submitted.revisionId, password: w.people[who].password, confirmed: true }),
};

type OwnedKind = Exclude<Ownership, 'none' | 'shared'>;

/** Who must be refused (and how), and who owns the record, for each kind of ownership. */
export const WRONG_OWNERS: Record<OwnedKind, { who: Person; status: 403 | 404 }[]> = {
  'scheme-reader': [{ who: 'otherDesigner', status: 404 }, { who: 'planning', status: 404 }],
  'scheme-designer': [{ who: 'otherDesigner', status: 404 }],
  'parcels-reader': [{ who: 'otherDesigner', status: 404 }, { who: 'otherChecker', status: 404 }],
  'certificate-reader': [{ who: 'otherDesigner', status: 404 }],
  'assigned-checker': [{ who: 'otherChecker', status: 403 }],
};

export const OWNERS: Record<OwnedKind, Person[]> = {
  'scheme-reader': ['designer', 'checker'],
  'scheme-designer': ['designer'],
  'parcels-reader': ['designer', 'checker'],
  'certificate-reader': ['designer', 'planning'],
  'assigned-checker': ['checker'],
};
