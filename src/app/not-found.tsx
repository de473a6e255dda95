import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-6 py-24">
      <p className="text-sm uppercase tracking-wider text-ink-faint">404 · Not found</p>
      <h1 className="mt-2 text-2xl font-semibold">There is nothing at this address</h1>
      <Link href="/home" className="mt-6 inline-block text-accent underline">Back to your home</Link>
    </main>
  );
}
