import localFont from 'next/font/local';

// The same files in fonts/ are embedded by pdfkit in certificates and letters.
export const sans = localFont({
  src: [
    { path: '../../fonts/IBMPlexSans-Regular.ttf', weight: '400', style: 'normal' },
    { path: '../../fonts/IBMPlexSans-Italic.ttf', weight: '400', style: 'italic' },
    { path: '../../fonts/IBMPlexSans-SemiBold.ttf', weight: '600', style: 'normal' },
  ],
  variable: '--font-sans',
  display: 'swap',
});

export const mono = localFont({
  src: [
    { path: '../../fonts/IBMPlexMono-Regular.ttf', weight: '400', style: 'normal' },
    { path: '../../fonts/IBMPlexMono-SemiBold.ttf', weight: '600', style: 'normal' },
  ],
  variable: '--font-mono',
  display: 'swap',
});
