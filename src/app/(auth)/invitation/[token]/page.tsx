import type { Metadata } from 'next';
import { AcceptInvitationForm } from './accept-invitation-form';

export const metadata: Metadata = { title: 'Accept invitation' };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return <AcceptInvitationForm token={token} />;
}
