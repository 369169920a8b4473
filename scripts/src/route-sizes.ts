/**
 * Prints what each route's first render loads: the entry chunk, the route's own chunk and every
 * chunk they import statically (the browser fetches those before the route renders), raw and
 * gzip level 9, read from the Vite manifest. CSS is listed apart.
 *
 *   node scripts/bootstrap.mjs route-sizes            builds web/ into a temporary folder first
 *   node scripts/bootstrap.mjs route-sizes <dist>     reads <dist>/.vite/manifest.json (a build with --manifest)
 *
 * A report, not a gate: it never fails on a size.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { repoPath } from './lib/paths.js';
import { npmCommand, packageBin, runChecked } from './lib/proc.js';

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  isDynamicEntry?: boolean;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

const ROUTES_DIR = 'src/app/routes/';

function closure(manifest: Manifest, keys: string[]): Set<string> {
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    seen.add(key);
    for (const next of manifest[key]?.imports ?? []) visit(next);
  };
  keys.forEach(visit);
  return seen;
}

function sizes(dist: string, files: Iterable<string>) {
  let raw = 0;
  let gzip = 0;
  for (const file of files) {
    const body = readFileSync(path.join(dist, file));
    raw += body.length;
    gzip += gzipSync(body, { level: 9 }).length;
  }
  return { raw, gzip };
}

const kB = (n: number) => (n / 1000).toFixed(1).padStart(7);

async function main() {
  let dist = process.argv[2] ? path.resolve(process.argv[2]) : '';
  let temporary = false;
  if (!dist) {
    dist = mkdtempSync(path.join(os.tmpdir(), 'driftmark-web-'));
    temporary = true;
    const [npm, ...npmArgs] = npmCommand();
    await runChecked(npm, [...npmArgs, 'run', 'build', '-w', 'shared']);
    const web = repoPath('web');
    await runChecked(
      process.execPath,
      [
        packageBin('vite', 'vite', web),
        'build',
        '--manifest',
        '--outDir',
        dist,
        '--emptyOutDir',
        '--logLevel',
        'warn',
      ],
      { cwd: web },
    );
  }
  try {
    const manifest = JSON.parse(readFileSync(path.join(dist, '.vite', 'manifest.json'), 'utf8')) as Manifest;
    const entry = Object.keys(manifest).find((key) => manifest[key]!.isEntry);
    if (!entry) throw new Error('the manifest has no entry chunk');
    const routes = Object.keys(manifest)
      .filter((key) => key.startsWith(ROUTES_DIR) && manifest[key]!.isDynamicEntry)
      .sort();
    console.log(
      `${'route (first render)'.padEnd(34)} ${'JS raw kB'.padStart(9)} ${'JS gzip kB'.padStart(10)} ${'CSS gzip kB'.padStart(11)}`,
    );
    const rows = [{ name: '(entry alone)', keys: [entry] }].concat(
      routes.map((key) => ({
        name: key.slice(ROUTES_DIR.length).replace(/\.tsx?$/, ''),
        keys: [entry, key],
      })),
    );
    for (const row of rows) {
      const chunks = [...closure(manifest, row.keys)].map((key) => manifest[key]!);
      const js = sizes(
        dist,
        chunks.map((chunk) => chunk.file),
      );
      const css = sizes(dist, new Set(chunks.flatMap((chunk) => chunk.css ?? [])));
      console.log(
        `${row.name.padEnd(34)} ${kB(js.raw).padStart(9)} ${kB(js.gzip).padStart(10)} ${kB(css.gzip).padStart(11)}`,
      );
    }
  } finally {
    if (temporary) rmSync(dist, { recursive: true, force: true });
  }
}

await main();
