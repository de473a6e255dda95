'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { LocalTime } from '@/components/ui/local-time';
import { StatusIcon } from '@/components/ui/status-icon';
import { cancelInvitationAction, resendInvitationAction } from './actions';

type Pending = { id: string; email: string; name: string; role: string; expiresAt: string; expired: boolean };

/** Invitations not yet accepted: each can be sent again with a new link, or cancelled. */
export function InvitationList({ invitations }: { invitations: Pending[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const run = async (invitation: Pending, what: 'resend' | 'cancel') => {
    const result = what === 'resend' ? await resendInvitationAction({ invitationId: invitation.id }) : await cancelInvitationAction({ invitationId: invitation.id });
    setMessage(result.ok ? { ok: true, text: what === 'resend' ? `A new link was sent to ${invitation.email}; the old one no longer works.` : `The invitation to ${invitation.email} is cancelled.` } : { ok: false, text: result.error });
    router.refresh();
  };
  return (
    <section aria-labelledby="invitations-heading" className="mt-8">
      <h2 id="invitations-heading" className="mb-2 text-lg font-semibold">Invitations not yet accepted</h2>
      {message ? <p role={message.ok ? 'status' : 'alert'} className={`mb-2 text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      {invitations.length === 0 ? <p className="text-sm text-ink-soft">None.</p> : (
        <ul className="divide-y divide-paper-edge text-sm">
          {invitations.map((i) => (
            <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span>{i.name} <span className="text-ink-soft">· {i.email} · {i.expired ? 'link expired' : <>link valid until <LocalTime iso={i.expiresAt} /></>}</span></span>
              <span className="flex gap-3">
                <button type="button" className="text-accent underline" onClick={() => run(i, 'resend')}>Resend<span className="sr-only"> the invitation to {i.email}</span></button>
                <button type="button" className="text-verdict-fail underline" onClick={() => run(i, 'cancel')}>Cancel<span className="sr-only"> the invitation to {i.email}</span></button>
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
