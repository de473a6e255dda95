import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { mono, sans } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Sillmark', template: '%s · Sillmark' },
  description: 'Checking and certifying the upstream flood impact of weirs and spillways.',
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en-GB" className={`${sans.variable} ${mono.variable}`}>
      <body>{children}</body>
    </html>
  );
}
