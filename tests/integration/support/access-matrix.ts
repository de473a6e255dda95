import type { Role } from '@/lib/auth/roles';

// Who may call what. Every route handler method under src/app/api and every server action must appear here:
// the access test fails for anything missing, so a new route cannot ship without its roles being decided.
export type Access = 'public' | readonly Role[];
const ALL: readonly Role[] = ['designer', 'checker', 'liaison', 'planning', 'admin'];

export const ROUTE_ACCESS: Record<string, Partial<Record<'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE', Access>>> = {
  'api/health': { GET: 'public' },
  'api/session': { GET: ALL },
  'api/schemes': { GET: ALL, POST: ['designer'] },
  'api/schemes/import': { POST: ['designer'] },
  'api/schemes/[id]': { GET: ALL },
  'api/schemes/[id]/case-file': { GET: ALL },
  'api/schemes/[id]/step-table': { GET: ALL },
  'api/schemes/[id]/calculation-sheet': { GET: ALL },
  'api/revisions/[id]': { GET: ALL, PUT: ['designer'] },
  'api/evaluate': { POST: ALL },
  'api/head-preview': { POST: ['designer'] },
  'api/uploads/survey': { POST: ['designer'] },
  'api/uploads/survey-preview': { POST: ['designer'] },
  'api/admin/users': { GET: ['admin'], POST: ['admin'] },
  'api/admin/users/[id]': { PATCH: ['admin'] },
  'api/admin/audit/csv': { GET: ['admin'] },
  'api/admin/outbox/[id]/attachment': { GET: ['admin'] },
  'api/certificates': { GET: ['planning', 'admin', 'checker', 'liaison'] },
  'api/certificates/[id]/pdf': { GET: ALL },
  'api/certificates/verification': { POST: ALL },
  'api/signing-certificate': { GET: 'public' },
  'api/parcels/[id]': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/parcels/[id]/csv': { POST: ['liaison'] },
  'api/parcels/[id]/csv-preview': { POST: ['liaison'] },
  'api/parcels/[id]/impact': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/parcels/[id]/plan': { POST: ['liaison'] },
  'api/parcels/[id]/export': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/letters/[id]': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/letters/batches/[id]': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/letters/batches/[id]/send': { POST: ['liaison'] },
  'api/letters/batches/[id]/print': { GET: ['liaison'] },
  'api/letters/reminders/[id]': { GET: ['liaison'] },
};

export const ACTION_ACCESS: Record<string, Record<string, Access>> = {
  '(auth)/sign-in': { signInAction: 'public' },
  '(auth)/invitation/[token]': { acceptInvitationAction: 'public' },
  '(portal)': { signOutAction: ALL },
  '(portal)/admin/users': { inviteUserAction: ['admin'], changeRoleAction: ['admin'], setUserActiveAction: ['admin'], resendInvitationAction: ['admin'], cancelInvitationAction: ['admin'] },
  '(portal)/revisions/[id]': { submitForCheckAction: ['designer'] },
  '(portal)/checks/[id]': { addReviewCommentAction: ['checker'], returnRevisionAction: ['checker'], countersignRevisionAction: ['checker'] },
  '(portal)/admin/certificates': { revokeCertificateAction: ['admin'] },
  '(portal)/schemes/new': { createSchemeAction: ['designer'] },
  '(portal)/schemes/[id]': { startDraftAction: ['designer'], adoptSizedCrestAction: ['designer'] },
  '(portal)/liaison/[id]/register': { saveParcelEditsAction: ['liaison'] },
  '(portal)/liaison/[id]/register/history': { restoreRegisterVersionAction: ['liaison'] },
  '(portal)/liaison/[id]/template': { saveLetterTemplateAction: ['liaison'], previewLetterAction: ['liaison', 'admin', 'designer', 'checker'] },
  '(portal)/liaison/[id]/letters': { generateLettersAction: ['liaison'], withdrawBatchAction: ['liaison'], resendLetterAction: ['liaison'], markPostedAction: ['liaison'] },
  '(portal)/liaison/[id]/letters/[letterId]': { logLetterResponseAction: ['liaison'], editLetterResponseAction: ['liaison'], makeReminderAction: ['liaison'] },
};

/**
 * Whose record a route or action acts on, so that the ownership test can call it as someone of an allowed role
 * who does not own it. Every entry of ROUTE_ACCESS and ACTION_ACCESS needs one (access-ownership.test.ts):
 * - 'none': acts on no one record (sign-in, lists filtered by the caller, creating, public files);
 * - 'shared': the role's common work with no single owner (any admin, any liaison officer);
 * - 'scheme-reader': one scheme or revision: a designer of other schemes, or a planning officer before it is certified, gets 404;
 * - 'scheme-designer': the scheme's own designer edits it: any other designer gets 404;
 * - 'parcels-reader': a scheme's owner details: designers and checkers not on that scheme get 404;
 * - 'certificate-reader': a certificate: a designer of other schemes gets 404;
 * - 'assigned-checker': a submitted revision: a checker other than the one assigned gets 403.
 */
export type Ownership = 'none' | 'shared' | 'scheme-reader' | 'scheme-designer' | 'parcels-reader' | 'certificate-reader' | 'assigned-checker';

export const ROUTE_OWNERSHIP: Record<string, Partial<Record<'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE', Ownership>>> = {
  'api/health': { GET: 'none' },
  'api/session': { GET: 'none' },
  'api/schemes': { GET: 'none', POST: 'none' },
  'api/schemes/import': { POST: 'none' },
  'api/schemes/[id]': { GET: 'scheme-reader' },
  'api/schemes/[id]/case-file': { GET: 'scheme-reader' },
  'api/schemes/[id]/step-table': { GET: 'scheme-reader' },
  'api/schemes/[id]/calculation-sheet': { GET: 'scheme-reader' },
  'api/revisions/[id]': { GET: 'scheme-reader', PUT: 'scheme-designer' },
  'api/evaluate': { POST: 'scheme-reader' },
  'api/head-preview': { POST: 'scheme-designer' },
  'api/uploads/survey': { POST: 'scheme-designer' },
  'api/uploads/survey-preview': { POST: 'scheme-designer' },
  'api/admin/users': { GET: 'shared', POST: 'shared' },
  'api/admin/users/[id]': { PATCH: 'shared' },
  'api/admin/audit/csv': { GET: 'shared' },
  'api/admin/outbox/[id]/attachment': { GET: 'shared' },
  'api/certificates': { GET: 'none' },
  'api/certificates/[id]/pdf': { GET: 'certificate-reader' },
  'api/certificates/verification': { POST: 'none' },
  'api/signing-certificate': { GET: 'none' },
  'api/parcels/[id]': { GET: 'parcels-reader' },
  'api/parcels/[id]/csv': { POST: 'shared' },
  'api/parcels/[id]/csv-preview': { POST: 'shared' },
  'api/parcels/[id]/impact': { GET: 'parcels-reader' },
  'api/parcels/[id]/plan': { POST: 'shared' },
  'api/parcels/[id]/export': { GET: 'parcels-reader' },
  'api/letters/[id]': { GET: 'parcels-reader' },
  'api/letters/batches/[id]': { GET: 'parcels-reader' },
  'api/letters/batches/[id]/send': { POST: 'shared' },
  'api/letters/batches/[id]/print': { GET: 'shared' },
  'api/letters/reminders/[id]': { GET: 'shared' },
};

export const ACTION_OWNERSHIP: Record<string, Record<string, Ownership>> = {
  '(auth)/sign-in': { signInAction: 'none' },
  '(auth)/invitation/[token]': { acceptInvitationAction: 'none' },
  '(portal)': { signOutAction: 'none' },
  '(portal)/admin/users': { inviteUserAction: 'shared', changeRoleAction: 'shared', setUserActiveAction: 'shared', resendInvitationAction: 'shared', cancelInvitationAction: 'shared' },
  '(portal)/revisions/[id]': { submitForCheckAction: 'scheme-designer' },
  '(portal)/checks/[id]': { addReviewCommentAction: 'assigned-checker', returnRevisionAction: 'assigned-checker', countersignRevisionAction: 'assigned-checker' },
  '(portal)/admin/certificates': { revokeCertificateAction: 'shared' },
  '(portal)/schemes/new': { createSchemeAction: 'none' },
  '(portal)/schemes/[id]': { startDraftAction: 'scheme-designer', adoptSizedCrestAction: 'scheme-designer' },
  '(portal)/liaison/[id]/register': { saveParcelEditsAction: 'shared' },
  '(portal)/liaison/[id]/register/history': { restoreRegisterVersionAction: 'shared' },
  '(portal)/liaison/[id]/template': { saveLetterTemplateAction: 'shared', previewLetterAction: 'parcels-reader' },
  '(portal)/liaison/[id]/letters': { generateLettersAction: 'shared', withdrawBatchAction: 'shared', resendLetterAction: 'shared', markPostedAction: 'shared' },
  '(portal)/liaison/[id]/letters/[letterId]': { logLetterResponseAction: 'shared', editLetterResponseAction: 'shared', makeReminderAction: 'shared' },
};
