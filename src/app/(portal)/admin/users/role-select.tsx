'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { ROLES, ROLE_LABELS, type Role } from '@/lib/auth/roles';
import { ConfirmPanel } from '@/components/ui/confirm-panel';
import { StatusIcon } from '@/components/ui/status-icon';
import { changeRoleAction } from './actions';

/**
 * A role is changed only by Save and then a confirmation naming the person and both roles: choosing in the list
 * (with the mouse or the arrow keys) changes nothing by itself.
 */
export function RoleSelect({ userId, role, userName }: { userId: string; role: Role; userName: string }) {
  const router = useRouter();
  const [chosen, setChosen] = useState<Role>(role);
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const save = async () => {
    setConfirming(false);
    const result = await changeRoleAction({ userId, role: chosen });
    setMessage(result.ok ? { ok: true, text: `${userName}’s role is now ${ROLE_LABELS[chosen]} (was ${ROLE_LABELS[role]}). They were signed out.` } : { ok: false, text: result.error });
    if (result.ok) router.refresh();
    else setChosen(role);
  };
  return (
    <span className="block">
      <span className="flex flex-wrap items-center gap-2">
        <label className="sr-only" htmlFor={`role-${userId}`}>Role of {userName}</label>
        <select id={`role-${userId}`} value={chosen} className="rounded border border-paper-edge bg-white px-2 py-1" onChange={(e) => { setChosen(e.target.value as Role); setMessage(null); setConfirming(false); }}>
          {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
        </select>
        {chosen !== role ? <button type="button" className="rounded border border-accent px-2 py-1 text-sm font-semibold text-accent" onClick={() => setConfirming(true)}>Save<span className="sr-only"> the role of {userName}</span></button> : null}
      </span>
      {confirming ? <ConfirmPanel id={`confirm-role-${userId}`} question={`Change ${userName}’s role from ${ROLE_LABELS[role]} to ${ROLE_LABELS[chosen]}? They will be signed out, and the new role applies when they sign in again.`} confirmLabel={`Yes, make ${userName} ${ROLE_LABELS[chosen]}`} onConfirm={save} onCancel={() => { setConfirming(false); setChosen(role); }} /> : null}
      {message ? <span role={message.ok ? 'status' : 'alert'} className={`mt-1 block text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</span> : null}
    </span>
  );
}
