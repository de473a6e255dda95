// Bundles the engine's worker-thread entry (src/lib/engine-pool/engine-worker.ts) into one plain ES module, which a
// worker thread can load under `npm start`, `next dev` and vitest alike. `npm run build` and `npm start` run it
// after `next build` (which empties the build folder); vitest's global set-up runs it for the integration tests.
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { buildSync } from 'esbuild';

const ENTRY = 'src/lib/engine-pool/engine-worker.ts';

/** Where the portal looks for the worker: SILLMARK_ENGINE_WORKER, or engine-worker.mjs in the Next build folder. */
export function engineWorkerPath(env = process.env, cwd = process.cwd()) {
  return env.SILLMARK_ENGINE_WORKER || path.join(cwd, env.NEXT_DIST_DIR ?? '.next', 'engine-worker.mjs');
}

export function buildEngineWorker({ outfile = engineWorkerPath(), cwd = process.cwd() } = {}) {
  buildSync({
    absWorkingDir: cwd,
    entryPoints: [ENTRY],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    tsconfig: 'tsconfig.json',
    logLevel: 'warning',
    // The worker returns piscina's move() marks, which piscina checks against its own module's private symbol: a
    // bundled copy of piscina would mark with another symbol, and the result would be cloned empty.
    external: ['piscina'],
    // Bundled CommonJS packages may call require(); an ES module has none of its own.
    banner: { js: "import { createRequire as sillmarkCreateRequire } from 'node:module'; const require = sillmarkCreateRequire(import.meta.url);" },
  });
  return outfile;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  console.log(`Engine worker bundled to ${path.relative(process.cwd(), buildEngineWorker())}`);
}
