import type { ReactNode } from 'react';

export function PageHeader({ eyebrow, title, children }: { eyebrow?: string; title: string; children?: ReactNode }) {
  return (
    <header className="mb-8 border-b border-paper-edge pb-4">
      {eyebrow ? <p className="text-xs uppercase tracking-wider text-ink-faint">{eyebrow}</p> : null}
      <h1 className="mt-1 text-2xl font-semibold">{title}</h1>
      {children ? <div className="mt-2 text-ink-soft">{children}</div> : null}
    </header>
  );
}
