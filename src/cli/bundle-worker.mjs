// One worker-thread entry bundled into one plain ES module, which a worker thread can load under `npm start`,
// `next dev` and vitest alike (neither Next's server bundle nor vitest can hand a TypeScript file to a worker).
import { buildSync } from 'esbuild';

/** Bundles `entry` to `outfile`; `external` packages are loaded from node_modules at run time. Returns the metafile. */
export function bundleWorker({ entry, outfile, cwd = process.cwd(), external = [], conditions }) {
  const { metafile } = buildSync({
    absWorkingDir: cwd,
    entryPoints: [entry],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    tsconfig: 'tsconfig.json',
    // piscina always stays outside: a worker returns piscina's move() marks, which piscina checks against its own
    // module's private symbol, so a bundled copy would mark with another symbol and the result be cloned empty.
    external: [...new Set(['piscina', ...external])],
    ...(conditions ? { conditions } : {}),
    metafile: true,
    logLevel: 'warning',
    // Bundled CommonJS packages may call require(); an ES module has none of its own.
    banner: { js: "import { createRequire as sillmarkCreateRequire } from 'node:module'; const require = sillmarkCreateRequire(import.meta.url);" },
  });
  return metafile;
}
