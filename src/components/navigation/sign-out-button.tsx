'use client';

import { signOutAction } from '@/app/(portal)/actions';

export function SignOutButton() {
  return (
    <div className="flex gap-3 text-sm">
      <button type="button" className="text-ink-soft underline hover:text-accent" onClick={() => signOutAction({ everywhere: false })}>Sign out</button>
      <button type="button" className="text-ink-faint underline hover:text-accent" onClick={() => signOutAction({ everywhere: true })}>Sign out everywhere</button>
    </div>
  );
}
