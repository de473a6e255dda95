// Certifies the demo scheme's first revision through the real use cases and starts draft revision 2 from it, over
// DATABASE_PATH, so a planning officer can read the scheme while its latest revision is a draft. Prints the ids.
// Run: npx tsx --conditions=react-server --tsconfig tsconfig.json tests/e2e/support/certify-demo-scheme.ts
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision, Scheme, User, closeSequelize, database } from '@/lib/db';
import { stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { countersignRevision } from '@/lib/review/countersign-revision';
import { startDraftFromRevision } from '@/lib/revisions/start-draft-from-revision';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { DEMO_USERS } from '../../../db/seeds/demo-users';

const asSession = (u: User): SessionUser => ({ id: u.id, email: u.email, name: u.name, role: u.role, status: u.status }) as SessionUser;

database();
const byRole = async (role: string) => asSession((await User.findOne({ where: { role, email: DEMO_USERS.find((d) => d.role === role)!.email } }))!);
const designer = await byRole('designer');
const checker = await byRole('checker');
const scheme = (await Scheme.findOne({ where: { reference: 'SM-0001' } }))!;
const first = (await Revision.findOne({ where: { schemeId: scheme.id, number: 1 } }))!;
await submitForCheck({ revisionId: first.id, checkerId: checker.id, designer, baseUrl: 'http://localhost:3000' });
await countersignRevision({ input: { revisionId: first.id, password: DEMO_USERS.find((d) => d.role === 'checker')!.password, confirmed: true }, checker, baseUrl: 'http://localhost:3000' });
await startDraftFromRevision({ revisionId: first.id, user: designer });
const draft = (await Revision.findOne({ where: { schemeId: scheme.id, number: 2 } }))!;
process.stdout.write(`${JSON.stringify({ schemeId: scheme.id, certifiedId: first.id, draftId: draft.id })}\n`);
await stopLocalSmtpServer();
await closeSequelize();
