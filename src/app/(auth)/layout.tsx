import type { ReactNode } from 'react';
import { BrandMark } from '@/components/navigation/brand-mark';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-6 py-12">
      <p className="mb-6 inline-flex items-center gap-2 text-lg font-semibold tracking-tight">
        <BrandMark /> Sillmark
      </p>
      <div className="rounded border border-paper-edge bg-white/70 p-6 shadow-sm">{children}</div>
      <p className="mt-6 text-xs text-ink-faint">Sillmark checks and certifies the upstream flood impact of weirs and spillways. Its results support, and never replace, a licensed engineer’s judgement and local regulations.</p>
    </main>
  );
}
