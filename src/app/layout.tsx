import type { Metadata } from 'next';
import { headers } from 'next/headers';
import type { ReactNode } from 'react';
import { mono, sans } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Sillmark', template: '%s · Sillmark' },
  description: 'Checking and certifying the upstream flood impact of weirs and spillways.',
};

// Read so that every page renders per request: Next puts the request's nonce on its scripts only then (see src/proxy.ts).
export default async function RootLayout({ children }: { children: ReactNode }) {
  await headers();
  return (
    <html lang="en-GB" className={`${sans.variable} ${mono.variable}`}>
      <body>{children}</body>
    </html>
  );
}
