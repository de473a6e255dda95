// The engine as the portal's worker runs it: one esbuild bundle (src/cli/bundle-worker.mjs, as the engine worker).
// Why: vitest loads TypeScript through Vite's module runner, which reads every imported name through a getter; the
// surveyed reach calls across modules at every evaluation, so timing it there measures the loader, not the engine.
import { fileURLToPath, pathToFileURL } from 'node:url';
// @ts-expect-error -- plain ESM helper shared with `npm run build`
import { bundleWorker } from '../../src/cli/bundle-worker.mjs';

type Engine = typeof import('@/lib/hydraulics');

export async function bundledEngine(): Promise<Engine> {
  const outfile = fileURLToPath(new URL('../.artifacts/engine-for-bench.mjs', import.meta.url));
  bundleWorker({ entry: 'src/lib/hydraulics/index.ts', outfile });
  return (await import(/* @vite-ignore */ `${pathToFileURL(outfile).href}?t=${Date.now()}`)) as Engine;
}
