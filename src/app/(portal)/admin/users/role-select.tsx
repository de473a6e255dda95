'use client';

import { useState, useTransition } from 'react';
import { ROLES, ROLE_LABELS, type Role } from '@/lib/auth/roles';
import { StatusIcon } from '@/components/ui/status-icon';
import { changeRoleAction } from './actions';

export function RoleSelect({ userId, role, userName }: { userId: string; role: Role; userName: string }) {
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <span>
      <label className="sr-only" htmlFor={`role-${userId}`}>Role of {userName}</label>
      <select
        id={`role-${userId}`}
        defaultValue={role}
        disabled={pending}
        className="rounded border border-paper-edge bg-white px-2 py-1"
        onChange={(e) => startTransition(async () => {
          const result = await changeRoleAction({ userId, role: e.target.value });
          setError(result.ok ? null : result.error);
        })}
      >
        {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r as Role]}</option>)}
      </select>
      {error ? <span role="alert" className="ml-2 text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{error}</span> : null}
    </span>
  );
}
