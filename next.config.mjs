/** @type {import('next').NextConfig} */
const nextConfig = {
  // Parallel test runs (several developers on one machine) may build into their own folder.
  distDir: process.env.NEXT_DIST_DIR ?? '.next',
  // Native and Node-only modules stay outside the server bundle and are required at run time.
  serverExternalPackages: ['sequelize', 'sqlite3', 'better-sqlite3', 'pdfkit', 'fontkit', '@node-rs/argon2', 'nodemailer', 'smtp-server', 'node-forge', '@signpdf/signpdf', '@signpdf/placeholder-plain', '@signpdf/signer-p12', 'piscina'],
  poweredByHeader: false,
  // `npm test` runs tsc over the whole project first; the build need not repeat it.
  typescript: { ignoreBuildErrors: true },
  reactStrictMode: true,
  typedRoutes: false,
  experimental: {
    authInterrupts: true,
    serverActions: { bodySizeLimit: '2mb' },
  },
  async headers() {
    return [
      {
        source: '/:path*',
        headers: [
          { key: 'X-Content-Type-Options', value: 'nosniff' },
          { key: 'Referrer-Policy', value: 'same-origin' },
          { key: 'X-Frame-Options', value: 'DENY' },
        ],
      },
    ];
  },
};

export default nextConfig;
