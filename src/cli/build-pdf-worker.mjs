// Bundles the PDF pool's worker-thread entry (src/lib/pdf-pool/pdf-worker.ts) into one plain ES module, built
// wherever the engine worker is (build-engine-worker.mjs): `npm run build`, `npm start`, `npm run dev`, vitest's set-up.
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { bundleWorker } from './bundle-worker.mjs';

const ENTRY = 'src/lib/pdf-pool/pdf-worker.ts';
// Loaded from node_modules at run time, as Next's server does (serverExternalPackages in next.config.mjs): pdfkit finds
// its own data files beside itself (and piscina, as for every worker: bundle-worker.mjs).
const EXTERNAL = ['pdfkit', 'fontkit', 'node-forge', '@signpdf/*'];

/** Where the portal looks for the worker: SILLMARK_PDF_WORKER, or pdf-worker.mjs in the Next build folder. */
export function pdfWorkerPath(env = process.env, cwd = process.cwd()) {
  return env.SILLMARK_PDF_WORKER || path.join(cwd, env.NEXT_DIST_DIR ?? '.next', 'pdf-worker.mjs');
}

// The worker only renders and signs what the request side read: the database stays on the request side.
const REQUEST_SIDE_ONLY = /^(src\/lib\/db\/|node_modules\/(sequelize|sqlite3|better-sqlite3)\/)/;

export function buildPdfWorker({ outfile = pdfWorkerPath(), cwd = process.cwd() } = {}) {
  // The renderers import 'server-only', which is an empty module under the server condition (as under tsx in the CLI).
  const metafile = bundleWorker({ entry: ENTRY, outfile, cwd, external: EXTERNAL, conditions: ['react-server', 'module'] });
  const strays = Object.keys(metafile.inputs).filter((input) => REQUEST_SIDE_ONLY.test(input));
  if (strays.length > 0) throw new Error(`The PDF worker must not load the database, but its bundle takes in ${strays.join(', ')}`);
  return outfile;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  console.log(`PDF worker bundled to ${path.relative(process.cwd(), buildPdfWorker())}`);
}
