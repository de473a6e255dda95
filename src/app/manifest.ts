import type { MetadataRoute } from 'next';

/** The portal as an installable app: its name, colours and the icons drawn from its own mark. */
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: 'Sillmark',
    short_name: 'Sillmark',
    description: 'Checking and certifying the upstream flood impact of weirs and spillways',
    start_url: '/home',
    display: 'standalone',
    background_color: '#faf8f3',
    theme_color: '#17636b',
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png' },
      { src: '/icon.svg', sizes: 'any', type: 'image/svg+xml' },
    ],
  };
}
