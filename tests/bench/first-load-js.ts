// First-load JavaScript of the wizard and results pages, from the production build's manifests (npm run bench:pages).
// Next 16 with Turbopack no longer prints the size table, so it is derived: the chunks every page boots with
// (build-manifest.json rootMainFiles) plus the chunks of the page's own entry and its layouts (entryJSFiles in the
// page's client-reference manifest). Polyfills (nomodule, old browsers only) and chunks loaded later on demand are
// left out, as Next's own table did. Sizes are the files' bytes and their gzip at the default level.
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import vm from 'node:vm';
import { gzipSync } from 'node:zlib';
// @ts-expect-error -- plain ESM helper shared with `npm start` and the e2e tests
import { buildIfNeeded } from '../../src/cli/build-if-needed.mjs';
import { machineDescription } from './machine';

const DIST = process.env.NEXT_DIST_DIR ?? '.next';
const PAGES = [
  { label: 'Design wizard', url: '/schemes/[id]/wizard/[step]', entry: '/(portal)/schemes/[id]/wizard/[step]/page' },
  { label: 'Results sheet', url: '/schemes/[id]/results', entry: '/(portal)/schemes/[id]/results/page' },
];

interface ClientManifest {
  entryJSFiles: Record<string, string[]>;
}

function readJson<T>(file: string): T {
  return JSON.parse(readFileSync(path.join(DIST, file), 'utf8')) as T;
}

function clientManifest(entry: string): ClientManifest {
  const context: { __RSC_MANIFEST?: Record<string, ClientManifest> } = {};
  vm.runInNewContext(readFileSync(path.join(DIST, 'server', 'app', `${entry}_client-reference-manifest.js`), 'utf8'), context);
  const manifest = context.__RSC_MANIFEST?.[entry];
  if (!manifest) throw new Error(`no client-reference manifest for ${entry} in ${DIST}`);
  return manifest;
}

/** The page's own entry and every layout above it: `[project]/src/app/(portal)/layout` is above `…/(portal)/schemes/[id]/results/page`. */
function entryChunks(entry: string): string[] {
  const { entryJSFiles } = clientManifest(entry);
  const pageKey = `[project]/src/app${entry}`;
  const pageDir = path.posix.dirname(pageKey);
  const keys = Object.keys(entryJSFiles).filter((key) => key === pageKey || (key.endsWith('/layout') && `${pageDir}/`.startsWith(`${path.posix.dirname(key)}/`)));
  if (!keys.includes(pageKey)) throw new Error(`the manifest of ${entry} does not list the page's own chunks`);
  return keys.flatMap((key) => entryJSFiles[key]);
}

const kB = (bytes: number) => `${(bytes / 1000).toFixed(1).padStart(7)} kB`;

buildIfNeeded();
const { rootMainFiles } = readJson<{ rootMainFiles: string[] }>('build-manifest.json');
console.log(`First-load JavaScript (from the build manifests in ${DIST}; next ${(JSON.parse(readFileSync(path.join('node_modules', 'next', 'package.json'), 'utf8')) as { version: string }).version})`);
console.log(`Machine: ${machineDescription()}\n`);
for (const page of PAGES) {
  const chunks = [...new Set([...rootMainFiles, ...entryChunks(page.entry)])];
  let raw = 0;
  let gzip = 0;
  for (const chunk of chunks) {
    const file = path.join(DIST, chunk);
    if (!existsSync(file)) throw new Error(`${chunk} is listed but not in ${DIST}`);
    const bytes = readFileSync(file);
    raw += bytes.length;
    gzip += gzipSync(bytes).length;
  }
  console.log(`${page.label.padEnd(14)} ${page.url.padEnd(28)} ${String(chunks.length).padStart(2)} chunks  ${kB(raw)} raw  ${kB(gzip)} gzip`);
}
