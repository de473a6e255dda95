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
  'api/schemes/[id]/routing-table': { GET: ALL },
  'api/schemes/[id]/calculation-sheet': { GET: ALL },
  'api/revisions/[id]': { GET: ALL, PUT: ['designer'] },
  'api/evaluate': { POST: ALL },
  'api/head-preview': { POST: ['designer'] },
  'api/uploads/survey': { POST: ['designer'] },
  'api/uploads/survey-preview': { POST: ['designer'] },
  'api/uploads/routing-csv-preview': { POST: ['designer'] },
  'api/admin/users': { GET: ['admin'], POST: ['admin'] },
  'api/admin/users/[id]': { PATCH: ['admin'] },
  'api/admin/audit/csv': { GET: ['admin'] },
  'api/certificates': { GET: ['planning', 'admin', 'checker', 'liaison'] },
  'api/certificates/[id]/pdf': { GET: ALL },
  'api/certificates/verification': { POST: ALL },
  'api/signing-certificate': { GET: 'public' },
  'api/parcels/[id]': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/parcels/[id]/csv': { POST: ['liaison'] },
  'api/parcels/[id]/csv-preview': { POST: ['liaison'] },
  'api/parcels/[id]/impact': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/parcels/[id]/plan': { POST: ['liaison'] },
  'api/letters/[id]': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/letters/batches/[id]': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/letters/batches/[id]/send': { POST: ['liaison'] },
};

export const ACTION_ACCESS: Record<string, Record<string, Access>> = {
  '(auth)/sign-in': { signInAction: 'public' },
  '(auth)/invitation/[token]': { acceptInvitationAction: 'public' },
  '(portal)': { signOutAction: ALL },
  '(portal)/admin/users': { inviteUserAction: ['admin'], changeRoleAction: ['admin'] },
  '(portal)/revisions/[id]': { submitForCheckAction: ['designer'] },
  '(portal)/checks/[id]': { addReviewCommentAction: ['checker'], returnRevisionAction: ['checker'], countersignRevisionAction: ['checker'] },
  '(portal)/admin/certificates': { revokeCertificateAction: ['admin'] },
  '(portal)/schemes/new': { createSchemeAction: ['designer'] },
  '(portal)/schemes/[id]': { startDraftAction: ['designer'], adoptSizedCrestAction: ['designer'] },
  '(portal)/liaison/[id]/register': { saveParcelEditsAction: ['liaison'] },
  '(portal)/liaison/[id]/register/history': { restoreRegisterVersionAction: ['liaison'] },
  '(portal)/liaison/[id]/template': { saveLetterTemplateAction: ['liaison'] },
  '(portal)/liaison/[id]/letters': { generateLettersAction: ['liaison'] },
  '(portal)/liaison/[id]/letters/[letterId]': { logLetterResponseAction: ['liaison'] },
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
  'api/schemes/[id]/routing-table': { GET: 'scheme-reader' },
  'api/schemes/[id]/calculation-sheet': { GET: 'scheme-reader' },
  'api/revisions/[id]': { GET: 'scheme-reader', PUT: 'scheme-designer' },
  'api/evaluate': { POST: 'scheme-reader' },
  'api/head-preview': { POST: 'scheme-designer' },
  'api/uploads/survey': { POST: 'scheme-designer' },
  'api/uploads/survey-preview': { POST: 'scheme-designer' },
  'api/uploads/routing-csv-preview': { POST: 'scheme-designer' },
  'api/admin/users': { GET: 'shared', POST: 'shared' },
  'api/admin/users/[id]': { PATCH: 'shared' },
  'api/admin/audit/csv': { GET: 'shared' },
  'api/certificates': { GET: 'none' },
  'api/certificates/[id]/pdf': { GET: 'certificate-reader' },
  'api/certificates/verification': { POST: 'none' },
  'api/signing-certificate': { GET: 'none' },
  'api/parcels/[id]': { GET: 'parcels-reader' },
  'api/parcels/[id]/csv': { POST: 'shared' },
  'api/parcels/[id]/csv-preview': { POST: 'shared' },
  'api/parcels/[id]/impact': { GET: 'parcels-reader' },
  'api/parcels/[id]/plan': { POST: 'shared' },
  'api/letters/[id]': { GET: 'parcels-reader' },
  'api/letters/batches/[id]': { GET: 'parcels-reader' },
  'api/letters/batches/[id]/send': { POST: 'shared' },
};

export const ACTION_OWNERSHIP: Record<string, Record<string, Ownership>> = {
  '(auth)/sign-in': { signInAction: 'none' },
  '(auth)/invitation/[token]': { acceptInvitationAction: 'none' },
  '(portal)': { signOutAction: 'none' },
  '(portal)/admin/users': { inviteUserAction: 'shared', changeRoleAction: 'shared' },
  '(portal)/revisions/[id]': { submitForCheckAction: 'scheme-designer' },
  '(portal)/checks/[id]': { addReviewCommentAction: 'assigned-checker', returnRevisionAction: 'assigned-checker', countersignRevisionAction: 'assigned-checker' },
  '(portal)/admin/certificates': { revokeCertificateAction: 'shared' },
  '(portal)/schemes/new': { createSchemeAction: 'none' },
  '(portal)/schemes/[id]': { startDraftAction: 'scheme-designer', adoptSizedCrestAction: 'scheme-designer' },
  '(portal)/liaison/[id]/register': { saveParcelEditsAction: 'shared' },
  '(portal)/liaison/[id]/register/history': { restoreRegisterVersionAction: 'shared' },
  '(portal)/liaison/[id]/template': { saveLetterTemplateAction: 'shared' },
  '(portal)/liaison/[id]/letters': { generateLettersAction: 'shared' },
  '(portal)/liaison/[id]/letters/[letterId]': { logLetterResponseAction: 'shared' },
};
