import Link from 'next/link';

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-xl px-6 py-24">
      <p className="text-sm uppercase tracking-wider text-verdict-fail">403 · Not for your role</p>
      <h1 className="mt-2 text-2xl font-semibold">This page belongs to another role</h1>
      <p className="mt-4 text-ink-soft">Your account’s role does not allow this page. If you need it, ask an administrator to change your role.</p>
      <Link href="/home" className="mt-6 inline-block text-accent underline">Back to your home</Link>
    </main>
  );
}
