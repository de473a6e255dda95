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
  'api/certificates': { GET: ['planning', 'admin', 'checker', 'liaison'] },
  'api/certificates/[id]/pdf': { GET: ALL },
  'api/certificates/verification': { POST: ALL },
  'api/signing-certificate': { GET: 'public' },
  'api/parcels/[id]': { GET: ['liaison', 'admin', 'designer', 'checker'] },
  'api/parcels/[id]/csv': { POST: ['liaison'] },
  'api/parcels/[id]/csv-preview': { POST: ['liaison'] },
  'api/parcels/[id]/impact': { GET: ['liaison', 'admin', 'designer', 'checker'] },
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
  '(portal)/liaison/[id]/template': { saveLetterTemplateAction: ['liaison'] },
  '(portal)/liaison/[id]/letters': { generateLettersAction: ['liaison'] },
  '(portal)/liaison/[id]/letters/[letterId]': { logLetterResponseAction: ['liaison'] },
};
