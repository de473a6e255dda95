'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { StatusIcon } from '@/components/ui/status-icon';
import { restoreRegisterVersionAction } from './actions';

/** Saves an earlier version's parcels as the next version, after the officer confirms; the history keeps both. */
export function RestoreButton({ schemeId, baseRegisterId, version }: { schemeId: string; baseRegisterId: string; version: number }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [asking, setAsking] = useState(false);
  const restore = async () => {
    const result = await restoreRegisterVersionAction({ schemeId, baseRegisterId, version, note: '' });
    setAsking(false);
    if (!result.ok) return setMessage({ ok: false, text: result.error });
    setMessage({ ok: true, text: `Restored as version ${result.data.version}.` });
    router.refresh();
  };
  return (
    <div className="text-sm">
      {asking ? (
        <span className="flex flex-wrap gap-2">
          <button type="button" className="rounded bg-accent px-2 py-1 font-semibold text-white" onClick={restore}>Save v{version} as a new version</button>
          <button type="button" className="text-ink-soft underline" onClick={() => setAsking(false)}>Cancel</button>
        </span>
      ) : (
        <button type="button" className="text-accent underline" onClick={() => setAsking(true)}>Restore v{version}</button>
      )}
      {message ? <p role={message.ok ? 'status' : 'alert'} className={message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
    </div>
  );
}
