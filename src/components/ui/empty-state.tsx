import type { ReactNode } from 'react';

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded border border-dashed border-paper-edge px-5 py-6 text-sm text-ink-soft">
      <p className="font-semibold text-ink">{title}</p>
      {children ? <div className="mt-1">{children}</div> : null}
    </div>
  );
}
