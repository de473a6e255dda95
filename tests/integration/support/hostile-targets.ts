import type { JsonPath, JsonValue } from '../../support/hostile-json';
import { dotted } from '../../support/hostile-json';
import type { Person, PortalWorld } from './portal-world';
import { demoCase } from './scheme-factory';
import { CHANNEL_STEP, FLOWS_STEP, LIMITS_STEP, SCHEME_STEP, STRUCTURE_STEP } from './scheme-requests';

// What the fuzzing sends where: for every route handler that reads a body and every server action, the role allowed
// to call it and one valid body. The fuzz test checks that this list covers the access matrix, so a new route or
// action must be added here too.

const json = <T>(value: T): JsonValue => JSON.parse(JSON.stringify(value)) as JsonValue;

export interface JsonBodyTarget {
  role: Person;
  id?: (world: PortalWorld) => string;
  query?: (world: PortalWorld) => string;
  valid: (world: PortalWorld) => JsonValue;
  /** Every field has a default, so any object is a valid body: only non-objects count as garbage. */
  objectsAreValid?: boolean;
  /** The issue path the server reports for a field of the body (PUT /api/revisions reports the step's own paths). */
  fieldOf?: (path: JsonPath) => string;
}

const stepField = (path: JsonPath) => (path[0] === 'values' && path.length > 1 ? dotted(path.slice(1)) : dotted(path));
const saveStep = (step: string, values: unknown): JsonBodyTarget => ({ role: 'designer', id: (w) => w.draft.revisionId, valid: () => json({ step, values }), fieldOf: stepField });

/** Route handlers whose body is JSON, keyed "METHOD route". One key may have several targets (each wizard step). */
export const JSON_BODY_TARGETS: Record<string, JsonBodyTarget[]> = {
  'POST api/evaluate': [{ role: 'designer', valid: (w) => json({ revisionId: w.draft.revisionId }) }, { role: 'planning', valid: () => json(demoCase('wendle-harrowfield-depth-control.json')) }],
  'POST api/head-preview': [{ role: 'designer', valid: (w) => json({ revisionId: w.draft.revisionId, control: STRUCTURE_STEP.control }) }],
  'POST api/schemes': [{ role: 'designer', valid: () => json(SCHEME_STEP) }],
  'PUT api/revisions/[id]': [saveStep('scheme', SCHEME_STEP), saveStep('channel', CHANNEL_STEP), saveStep('flows', FLOWS_STEP), saveStep('structure', STRUCTURE_STEP), saveStep('limits', LIMITS_STEP)],
  'POST api/letters/batches/[id]/send': [{ role: 'liaison', id: (w) => w.letters.batchId, valid: () => json({ max: 5, retryFailed: false }), objectsAreValid: true }],
  'POST api/admin/users': [{ role: 'admin', valid: () => json({ email: 'new.engineer@wendle-valley.test', name: 'New Engineer', role: 'checker' }) }],
  'PATCH api/admin/users/[id]': [{ role: 'admin', id: (w) => w.people.otherChecker.user.id, valid: () => json({ role: 'designer' }) }],
};

export interface RawBodyTarget {
  role: Person;
  id?: (world: PortalWorld) => string;
  query?: (world: PortalWorld) => string;
  contentType: string;
  /** A valid body, as text: for a JSON file the fuzzing also mutates its fields. */
  validJson?: () => JsonValue;
  /** A preview answers 200 with `ok: false` and the problems line by line (the page lists them); it stores nothing either way. */
  previewReportsIssues?: boolean;
}

/** Route handlers whose body is a file (CSV, a case file, a multipart PDF upload). */
export const RAW_BODY_TARGETS: Record<string, RawBodyTarget> = {
  'POST api/schemes/import': { role: 'designer', contentType: 'application/json', validJson: () => json(demoCase()) },
  'POST api/uploads/survey': { role: 'designer', query: (w) => `revision=${w.draft.revisionId}`, contentType: 'text/csv' },
  'POST api/uploads/survey-preview': { role: 'designer', query: (w) => `revision=${w.draft.revisionId}`, contentType: 'text/csv' },
  'POST api/parcels/[id]/csv': { role: 'liaison', id: (w) => w.certified.schemeId, contentType: 'text/csv' },
  'POST api/parcels/[id]/csv-preview': { role: 'liaison', id: (w) => w.certified.schemeId, contentType: 'text/csv', previewReportsIssues: true },
  'POST api/parcels/[id]/plan': { role: 'liaison', id: (w) => w.certified.schemeId, contentType: 'application/geo+json' },
  'POST api/certificates/verification': { role: 'planning', contentType: 'multipart/form-data; boundary=----sillmark' },
};

export interface QueryTarget {
  role: Person;
  /** The record in the route's path, for routes under an [id]. */
  id?: (world: PortalWorld) => string;
  /** A valid query (without the "?"). */
  valid: (world: PortalWorld) => string;
  /** Hostile queries, each with the field its refusal must name. */
  hostile: { query: string; field: string }[];
}

/** GET route handlers that read filters from their query, keyed "GET route": bad filters get 400 naming the field. */
export const QUERY_TARGETS: Record<string, QueryTarget> = {
  'GET api/parcels/[id]/export': {
    role: 'liaison',
    id: (w) => w.certified.schemeId,
    valid: () => 'table=impact',
    hostile: [
      { query: 'table=owners', field: 'table' },
      { query: 'table=%3DHYPERLINK(%22x%22)', field: 'table' },
      { query: 'table=register&table=impact', field: 'table' },
      { query: 'table=impact&revision=..%2F..%2Fetc', field: 'revision' },
    ],
  },
  'GET api/admin/audit/csv': {
    role: 'admin',
    valid: (w) => `person=${w.people.designer.user.id}&action=user.signed-in&from=2026-01-01&to=2026-12-31&q=Harrowfield`,
    hostile: [
      { query: 'action=certificate.deleted', field: 'action' },
      { query: 'action=%3DHYPERLINK(%22x%22)', field: 'action' },
      { query: 'from=2026-02-30', field: 'from' },
      { query: 'from=yesterday', field: 'from' },
      { query: 'from=2026-05-02&to=2026-05-01', field: 'to' },
      { query: `q=${'x'.repeat(201)}`, field: 'q' },
      { query: 'person=no-such-person', field: 'person' },
      { query: `scheme=${'s'.repeat(65)}`, field: 'scheme' },
      { query: 'scheme=no-such-scheme', field: 'scheme' },
      { query: 'person=a&person=b', field: 'person' },
      { query: 'before=-1', field: 'before' },
    ],
  },
};

export interface ActionTarget {
  role: Person | 'anonymous';
  valid: (world: PortalWorld) => JsonValue;
  objectsAreValid?: boolean;
}

const parcel = { reference: 'HM-01', ownerName: 'Harrowfield Mill Trust', postalAddress: 'Mill House, Mill Lane, Harrowfield', email: 'trustees@harrowfield-mill.test', distanceFromM: 20, distanceToM: 160, bankSide: 'right', groundLevelM: 34.1, landUse: 'mill yard' };
const paragraphs = { introduction: 'We write on behalf of the Wendle Valley Drainage Board.', scheme: 'The weir at Harrowfield Mill is to be renewed.', response: 'Please reply within four weeks.', contact: 'Liaison officer, Harrowfield District Council', signOff: 'A. Liaison, Landowner liaison officer' };

/** Server actions, keyed "folder actionName" as in ACTION_ACCESS. */
export const ACTION_TARGETS: Record<string, ActionTarget> = {
  '(auth)/sign-in signInAction': { role: 'anonymous', valid: () => json({ email: 'someone@wendle-valley.test', password: 'not-the-password' }) },
  '(auth)/invitation/[token] acceptInvitationAction': { role: 'anonymous', valid: () => json({ token: 'x'.repeat(32), password: 'a-long-new-password', confirmPassword: 'a-long-new-password' }) },
  '(portal) signOutAction': { role: 'designer', valid: () => json({ everywhere: true }), objectsAreValid: true },
  '(portal)/admin/users inviteUserAction': { role: 'admin', valid: () => json({ email: 'new.engineer@wendle-valley.test', name: 'New Engineer', role: 'checker' }) },
  '(portal)/admin/users changeRoleAction': { role: 'admin', valid: (w) => json({ userId: w.people.otherChecker.user.id, role: 'designer' }) },
  '(portal)/admin/users setUserActiveAction': { role: 'admin', valid: (w) => json({ userId: w.people.otherChecker.user.id, active: false }) },
  '(portal)/admin/users resendInvitationAction': { role: 'admin', valid: () => json({ invitationId: 'no-such-invitation' }) },
  '(portal)/admin/users cancelInvitationAction': { role: 'admin', valid: () => json({ invitationId: 'no-such-invitation' }) },
  '(portal)/revisions/[id] submitForCheckAction': { role: 'designer', valid: (w) => json({ revisionId: w.draft.revisionId, checkerId: w.people.checker.user.id }) },
  '(portal)/checks/[id] addReviewCommentAction': { role: 'checker', valid: (w) => json({ revisionId: w.submitted.revisionId, part: 'results', body: 'The roughness upstream looks low.' }) },
  '(portal)/checks/[id] returnRevisionAction': { role: 'checker', valid: (w) => json({ revisionId: w.submitted.revisionId, summary: 'Justify Manning’s n for the upper reach.' }) },
  '(portal)/checks/[id] countersignRevisionAction': { role: 'checker', valid: (w) => json({ revisionId: w.submitted.revisionId, password: w.people.checker.password, confirmed: true }) },
  '(portal)/admin/certificates revokeCertificateAction': { role: 'admin', valid: (w) => json({ certificateId: w.certified.certificateId, reason: 'Issued in error during testing.', confirmed: true, password: w.people.admin.password }) },
  '(portal)/schemes/new createSchemeAction': { role: 'designer', valid: () => json(SCHEME_STEP) },
  '(portal)/schemes/[id] startDraftAction': { role: 'designer', valid: (w) => json({ revisionId: w.certified.revisionId }) },
  '(portal)/schemes/[id] adoptSizedCrestAction': { role: 'designer', valid: (w) => json({ revisionId: w.draft.revisionId }) },
  '(portal)/liaison/[id]/register saveParcelEditsAction': { role: 'liaison', valid: (w) => json({ schemeId: w.certified.schemeId, baseRegisterId: w.certified.registerId ?? 'none', note: 'fuzz', parcels: [parcel] }) },
  '(portal)/liaison/[id]/register/history restoreRegisterVersionAction': { role: 'liaison', valid: (w) => json({ schemeId: w.certified.schemeId, baseRegisterId: w.certified.registerId ?? 'none', version: 1, note: '' }) },
  '(portal)/liaison/[id]/template saveLetterTemplateAction': { role: 'liaison', valid: (w) => json({ schemeId: w.certified.schemeId, responseDays: 28, ...paragraphs }) },
  '(portal)/liaison/[id]/template previewLetterAction': { role: 'liaison', valid: (w) => json({ schemeId: w.certified.schemeId, responseDays: 28, parcelReference: 'HM-02', ...paragraphs }) },
  '(portal)/liaison/[id]/letters generateLettersAction': { role: 'liaison', valid: (w) => json({ schemeId: w.certified.schemeId, revisionId: w.certified.revisionId, parcelReferences: ['HM-02'] }) },
  '(portal)/liaison/[id]/letters withdrawBatchAction': { role: 'liaison', valid: (w) => json({ batchId: w.letters.batchId }) },
  '(portal)/liaison/[id]/letters resendLetterAction': { role: 'liaison', valid: (w) => json({ letterId: w.letters.letterId }) },
  '(portal)/liaison/[id]/letters markPostedAction': { role: 'liaison', valid: (w) => json({ letterId: w.letters.letterId, postedOn: '2026-01-12' }) },
  '(portal)/liaison/[id]/letters/[letterId] logLetterResponseAction': { role: 'liaison', valid: (w) => json({ letterId: w.letters.letterId, receivedOn: '2026-01-12', responseType: 'no-objection', channel: 'telephone', summary: 'Owner telephoned; no objection.' }) },
  '(portal)/liaison/[id]/letters/[letterId] editLetterResponseAction': { role: 'liaison', valid: () => json({ responseId: 'no-such-response', receivedOn: '2026-01-12', responseType: 'question', channel: 'post', summary: 'Owner wrote asking about the gateway.' }) },
  '(portal)/liaison/[id]/letters/[letterId] makeReminderAction': { role: 'liaison', valid: (w) => json({ letterId: w.letters.letterId }) },
};
