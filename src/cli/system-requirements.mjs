// The tests need Debian's chromium (browser tests, never a downloaded browser) and pdfsig (poppler-utils) for signed PDFs.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const NEEDS = [
  { binary: '/usr/bin/chromium', debianPackage: 'chromium' },
  { binary: '/usr/bin/pdfsig', debianPackage: 'poppler-utils' },
];

export function ensureSystemPackages() {
  const missing = NEEDS.filter((n) => !existsSync(n.binary));
  if (missing.length === 0) return;
  const names = missing.map((m) => m.debianPackage);
  if (process.getuid?.() !== 0) {
    console.error(`Missing system packages: ${names.join(', ')}. Install them with: sudo apt-get install -y ${names.join(' ')}`);
    process.exit(1);
  }
  console.log(`Installing Debian packages: ${names.join(', ')}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', '--no-install-recommends', ...names]]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) {
      console.error(`apt-get ${args[0]} failed; install ${names.join(' ')} by hand.`);
      process.exit(1);
    }
  }
}
