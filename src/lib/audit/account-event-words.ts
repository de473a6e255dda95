import { ROLE_LABELS, isRole } from '@/lib/auth/roles';
import { type Details, type Words, count, plural, text } from './event-details';

const role = (value: string | null) => (value && isRole(value) ? ROLE_LABELS[value].toLowerCase() : 'an unknown role');
const possessive = (name: string) => `${name}’s`;

const FILTER_WORDS: Record<string, string> = { person: 'person', action: 'kind of event', scheme: 'scheme', from: 'first day', to: 'last day', q: 'search' };
const filterNames = (d: Details) => {
  const filters = d.filters && typeof d.filters === 'object' ? Object.keys(d.filters).filter((k) => Object.hasOwn(FILTER_WORDS, k)).map((k) => FILTER_WORDS[k]) : [];
  return filters.join(', ');
};

const account: Words = (event, _details, names) => (event.entityId ? `${possessive(names.person(event.entityId))} account` : 'an account that does not exist');

const FAILED_SIGN_IN: Record<string, Words> = {
  'unknown account': () => 'tried to sign in with an e-mail address that has no account',
  'account not active': (e, d, n) => `tried to sign in to ${account(e, d, n)}, which is not active`,
  'wrong password': (e, d, n) => `tried to sign in to ${account(e, d, n)} with a wrong password`,
};

const RESTRICTION: Record<string, Words> = {
  'account-client': (e, d, n) => `was locked out of ${account(e, d, n)} from one computer after repeated failed sign-ins`,
  account: (e, d, n) => `caused sign-ins to ${account(e, d, n)} to be slowed down after repeated failures`,
  client: () => 'caused sign-ins from one network to be slowed down after repeated failures',
};

/** Signing in and out, invitations, roles, the password re-entered to countersign or revoke, and copies of the trail. */
export const ACCOUNT_WORDS: Record<string, Words> = {
  'user.signed-in': () => 'signed in',
  'user.sign-in-failed': (e, d, n) => (FAILED_SIGN_IN[text(d, 'reason') ?? ''] ?? FAILED_SIGN_IN['wrong password'])(e, d, n),
  'user.sign-in-locked-out': (e, d, n) => (RESTRICTION[text(d, 'scope') ?? ''] ?? RESTRICTION.account)(e, d, n),
  'user.signed-out': (_e, d) => (d.everywhere === true ? 'signed out on every device' : 'signed out'),
  'user.invited': (_e, d) => `invited ${text(d, 'email') ?? 'someone'} as ${role(text(d, 'role'))}`,
  'user.invitation-accepted': () => 'accepted their invitation and chose a password',
  'user.role-changed': (e, d, n) => `changed ${possessive(n.person(e.entityId))} role from ${role(text(d, 'from'))} to ${role(text(d, 'to'))}`,
  'user.deactivated': (e, _d, n) => `deactivated ${possessive(n.person(e.entityId))} account, ending their sessions`,
  'user.reactivated': (e, _d, n) => `reactivated ${possessive(n.person(e.entityId))} account`,
  'user.invitation-resent': (_e, d) => `resent the invitation to ${text(d, 'email') ?? 'someone'}, with a new link`,
  'user.invitation-cancelled': (_e, d) => `cancelled the invitation to ${text(d, 'email') ?? 'someone'}`,
  'user.countersign-password-failed': () => 'entered a wrong password when countersigning',
  'user.countersign-locked-out': () => 'was locked out of countersigning after repeated wrong passwords',
  'user.revoke-password-failed': () => 'entered a wrong password when revoking a certificate',
  'user.revoke-locked-out': () => 'was locked out of revoking after repeated wrong passwords',
  'audit.exported': (_e, d) => `exported ${plural(count(d, 'events') ?? 0, 'event')} of the audit trail as CSV${filterNames(d) ? `, filtered by ${filterNames(d)}` : ', unfiltered'}`,
};
