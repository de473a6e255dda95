'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { ConfirmPanel } from '@/components/ui/confirm-panel';
import { StatusIcon } from '@/components/ui/status-icon';
import { setUserActiveAction } from './actions';

/** Deactivates (sessions end, no sign-in, records kept) or reactivates an account, after a confirmation naming the person. */
export function AccountSwitch({ userId, userName, status }: { userId: string; userName: string; status: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  if (status === 'invited') return null;
  const active = status === 'active';
  const apply = async () => {
    setConfirming(false);
    const result = await setUserActiveAction({ userId, active: !active });
    setMessage(result.ok ? { ok: true, text: active ? `${userName} is deactivated and signed out.` : `${userName} can sign in again.` } : { ok: false, text: result.error });
    router.refresh();
  };
  return (
    <span className="block">
      <button type="button" className={`rounded border px-2 py-1 text-sm ${active ? 'border-verdict-fail text-verdict-fail' : 'border-accent text-accent'}`} onClick={() => setConfirming(true)}>{active ? 'Deactivate' : 'Reactivate'}<span className="sr-only"> {userName}</span></button>
      {confirming ? <ConfirmPanel tone={active ? 'danger' : 'normal'} id={`confirm-active-${userId}`} question={active ? `Deactivate ${userName}? Their sessions end now and they cannot sign in; everything they did stays on record.` : `Reactivate ${userName}? They can sign in again with their password.`} confirmLabel={active ? `Yes, deactivate ${userName}` : `Yes, reactivate ${userName}`} onConfirm={apply} onCancel={() => setConfirming(false)} /> : null}
      {message ? <span role={message.ok ? 'status' : 'alert'} className={`mt-1 block text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</span> : null}
    </span>
  );
}
