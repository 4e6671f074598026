/**
 * Client size benchmark: builds the client with Vite into a temporary folder (with a manifest)
 * and prints the gzip size of the JavaScript two pages load:
 * - the home page: the entry chunk and every chunk it imports statically;
 * - a tour page: the home set plus the tour route's lazy chunk and the video player's lazy chunk
 *   (with their static imports), which load only when a tour is opened.
 * Each figure is printed with its ratio to the 170 kB gzip target for the home page, and the run
 * says whether the player chunk stayed out of the home page's set (it must stay lazy).
 *
 * Run: npm run bench:client   (tsx --tsconfig tsconfig.server.json bench/client.bench.ts)
 * Gzip is Node's zlib at its default level, the figure a plain gzip-serving web server gives.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

const ROOT = path.resolve(import.meta.dirname, '..');
const TARGET_GZIP_KB = 170;
const ENTRY = 'index.html';
const TOUR_ROUTE = 'src/app/routes/tour.tsx';
const PLAYER = 'src/features/tours/components/tour-player.tsx';

interface ManifestChunk {
  file: string;
  imports?: string[];
  dynamicImports?: string[];
  css?: string[];
  isEntry?: boolean;
}
type Manifest = Record<string, ManifestChunk>;

/** The chunk and everything it imports statically (not its lazy imports), as manifest keys. */
function staticClosure(manifest: Manifest, start: string, into = new Set<string>()): Set<string> {
  if (into.has(start)) return into;
  const chunk = manifest[start];
  if (!chunk) throw new Error(`The manifest has no chunk "${start}".`);
  into.add(start);
  for (const dep of chunk.imports ?? []) staticClosure(manifest, dep, into);
  return into;
}

interface Sizes {
  chunks: number;
  rawBytes: number;
  gzipBytes: number;
}

function measure(outDir: string, manifest: Manifest, keys: Iterable<string>): Sizes {
  const files = new Set<string>();
  for (const k of keys) {
    const file = manifest[k]!.file;
    if (file.endsWith('.js')) files.add(file);
  }
  let rawBytes = 0;
  let gzipBytes = 0;
  for (const f of files) {
    const body = readFileSync(path.join(outDir, f));
    rawBytes += body.length;
    gzipBytes += gzipSync(body).length;
  }
  return { chunks: files.size, rawBytes, gzipBytes };
}

function kb(bytes: number): string {
  return (bytes / 1000).toFixed(1).padStart(7);
}

function main(): void {
  const outDir = mkdtempSync(path.join(os.tmpdir(), 'grovewalk-client-bench-'));
  try {
    const started = Date.now();
    const build = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/vite/bin/vite.js'), 'build', '--outDir', outDir, '--emptyOutDir', '--manifest', '--logLevel', 'warn'], {
      cwd: ROOT,
      stdio: ['ignore', 'inherit', 'inherit'],
    });
    if (build.status !== 0) throw new Error('vite build failed');
    const buildMs = Date.now() - started;
    const manifest = JSON.parse(readFileSync(path.join(outDir, '.vite/manifest.json'), 'utf8')) as Manifest;
    if (!manifest[ENTRY]?.isEntry) throw new Error(`"${ENTRY}" is not the entry in the manifest.`);

    const home = staticClosure(manifest, ENTRY);
    const tour = new Set(home);
    staticClosure(manifest, TOUR_ROUTE, tour);
    staticClosure(manifest, PLAYER, tour);
    const playerLazy = !home.has(PLAYER) && (manifest[TOUR_ROUTE]?.dynamicImports ?? []).some((k) => k === PLAYER || staticClosure(manifest, k).has(PLAYER));

    const rows: [string, Sizes][] = [
      ['home page (entry + static imports)', measure(outDir, manifest, home)],
      ['tour page (home + tour route + player)', measure(outDir, manifest, tour)],
      ['  of which the player chunk', measure(outDir, manifest, [PLAYER])],
    ];
    const cssHome = manifest[ENTRY]!.css ?? [];
    const cssGzip = cssHome.reduce((sum, f) => sum + gzipSync(readFileSync(path.join(outDir, f))).length, 0);
    const allJs = Object.values(manifest).filter((c) => c.file.endsWith('.js'));
    const allJsBytes = [...new Set(allJs.map((c) => c.file))].reduce((s, f) => s + statSync(path.join(outDir, f)).size, 0);

    console.log(`\nClient size (vite build in ${(buildMs / 1000).toFixed(1)} s; gzip = Node zlib default level; 1 kB = 1000 B)\n`);
    console.log(`${'what'.padEnd(42)} ${'chunks'.padStart(6)} ${'raw kB'.padStart(8)} ${'gzip kB'.padStart(8)}  ratio to ${TARGET_GZIP_KB} kB`);
    for (const [label, s] of rows) {
      console.log(`${label.padEnd(42)} ${String(s.chunks).padStart(6)} ${kb(s.rawBytes)}  ${kb(s.gzipBytes)}  ${(s.gzipBytes / 1000 / TARGET_GZIP_KB).toFixed(3)}`);
    }
    console.log(`\nhome page CSS (not counted above): ${(cssGzip / 1000).toFixed(1)} kB gzip`);
    console.log(`all JavaScript in the build: ${allJs.length} manifest chunks, ${(allJsBytes / 1000).toFixed(1)} kB raw`);
    console.log(`player chunk lazy (not in the home set, reached only through a dynamic import): ${playerLazy ? 'yes' : 'NO'}`);
    const homeKb = rows[0]![1].gzipBytes / 1000;
    console.log(`\nhome page target ≤ ${TARGET_GZIP_KB} kB gzip: ${homeKb.toFixed(1)} kB (${homeKb <= TARGET_GZIP_KB ? 'within' : 'OVER'} the target)\n`);
  } finally {
    rmSync(outDir, { recursive: true, force: true });
  }
}

main();
