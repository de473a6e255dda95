import type { Metadata } from 'next';
import { invitationStanding } from '@/lib/users/manage-invitation';
import { AcceptInvitationForm } from './accept-invitation-form';

export const metadata: Metadata = { title: 'Accept invitation' };

const REFUSALS = {
  unknown: 'This invitation link is not one the portal knows. Check that the whole link was copied, or ask an administrator for a new one.',
  used: 'This invitation link has been used already: the account is set up. Sign in instead, or ask an administrator if you have forgotten your password.',
  expired: 'This invitation link has expired. Ask an administrator to send you a new one.',
  cancelled: 'This invitation was cancelled by an administrator. Ask them if you still need an account.',
} as const;

// The link is checked when the page opens, so a used, expired, cancelled or unknown link never shows a form.
export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const standing = token.length >= 20 && token.length <= 200 ? await invitationStanding(token) : ({ ok: false, reason: 'unknown' } as const);
  if (!standing.ok) {
    return (
      <div>
        <h1 className="mb-4 text-xl font-semibold">This invitation link does not work</h1>
        <p role="alert" className="border-l-4 border-verdict-fail px-3 py-2 text-sm">{REFUSALS[standing.reason]}</p>
      </div>
    );
  }
  return (
    <>
      <p className="mb-4 text-sm" data-testid="invitation-for">This link sets up the account of <strong>{standing.name}</strong> ({standing.email}) as {standing.role}.</p>
      <AcceptInvitationForm token={token} />
    </>
  );
}
