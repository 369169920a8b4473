/**
 * The first-route JavaScript budget: what the sign-in screen and the athlete's Today screen load
 * before they can draw, computed from Vite's manifest (dist/.vite/manifest.json) as the entry
 * chunk, the route's own chunk and every chunk either imports statically (dynamic imports load
 * later and are not counted).
 *
 * The one place of the budget figure. `vite build` runs the check after writing the bundle
 * (vite.config.ts); `npm run budget -w web` runs it alone on the last build; `npm run bench`
 * reports the same figures. Goal from issue 13 ("a well-split first route: 100–150 kB gzip",
 * common practice, no source).
 */
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

/** At most this many bytes of gzip-compressed JavaScript per first route (150 kB = 150,000 bytes). */
export const FIRST_ROUTE_BUDGET_GZIP_BYTES = 150_000;

/** The first routes and the source module of each (keys of Vite's manifest). */
export const FIRST_ROUTES = {
  'sign-in': 'src/app/routes/sign-in.tsx',
  today: 'src/app/routes/athlete-home.tsx',
} as const;
export type FirstRoute = keyof typeof FIRST_ROUTES;

/** Whether `vite build` fails over budget (it does; `FIRST_ROUTE_BUDGET=warn` only warns, for one build). */
export const FIRST_ROUTE_BUDGET_FAILS_BUILD = true;

/** `FIRST_ROUTE_BUDGET=enforce` (or `warn`) overrides FIRST_ROUTE_BUDGET_FAILS_BUILD for one run. */
export const BUDGET_MODE_VARIABLE = 'FIRST_ROUTE_BUDGET';

interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  imports?: string[];
}
export type ViteManifest = Record<string, ManifestChunk>;

export interface RouteBytes {
  route: FirstRoute;
  /** The JavaScript files the route loads before drawing, as served under dist/. */
  files: string[];
  raw: number;
  gzip: number;
  brotli: number;
}

export function manifestPath(distDir: string): string {
  return path.join(distDir, '.vite', 'manifest.json');
}

/** Files of `keys` and of everything they import statically, each once. */
export function staticClosure(manifest: ViteManifest, keys: readonly string[]): string[] {
  const seen = new Set<string>();
  const files: string[] = [];
  const visit = (key: string): void => {
    if (seen.has(key)) return;
    seen.add(key);
    const chunk = manifest[key];
    if (!chunk) throw new Error(`The Vite manifest has no entry "${key}".`);
    if (chunk.file.endsWith('.js')) files.push(chunk.file);
    for (const imported of chunk.imports ?? []) visit(imported);
  };
  for (const key of keys) visit(key);
  return files;
}

/** Size of a built file as sent: the precompressed sibling when the build wrote one, else compressed here. */
function sizes(distDir: string, file: string): { raw: number; gzip: number; brotli: number } {
  const body = readFileSync(path.join(distDir, file));
  const sibling = (ext: string, make: () => Buffer): number => {
    const full = path.join(distDir, `${file}.${ext}`);
    return existsSync(full) ? readFileSync(full).length : make().length;
  };
  return {
    raw: body.length,
    gzip: sibling('gz', () => gzipSync(body, { level: 9 })),
    brotli: sibling('br', () =>
      brotliCompressSync(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }),
    ),
  };
}

/** The first routes' JavaScript, measured from a build in `distDir`. */
export function measureFirstRoutes(distDir: string): RouteBytes[] {
  const manifest = JSON.parse(readFileSync(manifestPath(distDir), 'utf8')) as ViteManifest;
  const entries = Object.entries(manifest)
    .filter(([, chunk]) => chunk.isEntry)
    .map(([key]) => key);
  return (Object.keys(FIRST_ROUTES) as FirstRoute[]).map((route) => {
    const files = staticClosure(manifest, [...entries, FIRST_ROUTES[route]]);
    const total = { raw: 0, gzip: 0, brotli: 0 };
    for (const file of files) {
      const s = sizes(distDir, file);
      total.raw += s.raw;
      total.gzip += s.gzip;
      total.brotli += s.brotli;
    }
    return { route, files, ...total };
  });
}

const kB = (bytes: number): string => `${(bytes / 1000).toFixed(1)} kB`;

/** Checks the budget; returns the lines to print and whether every route fits. */
export function checkBudget(distDir: string): { ok: boolean; lines: string[] } {
  const routes = measureFirstRoutes(distDir);
  const lines = routes.map(
    (r) =>
      `${r.gzip <= FIRST_ROUTE_BUDGET_GZIP_BYTES ? 'ok  ' : 'OVER'} ${r.route.padEnd(8)} ` +
      `${kB(r.gzip)} gzip (${kB(r.brotli)} brotli, ${kB(r.raw)} raw, ${r.files.length} files) ` +
      `budget ${kB(FIRST_ROUTE_BUDGET_GZIP_BYTES)} gzip`,
  );
  return { ok: routes.every((r) => r.gzip <= FIRST_ROUTE_BUDGET_GZIP_BYTES), lines };
}

/**
 * Prints the check; true when the caller may go on: within budget, or over it while failing is
 * off (`enforce`: the default of the build, FIRST_ROUTE_BUDGET_FAILS_BUILD, unless the variable says).
 */
export function reportBudget(
  distDir: string,
  options: { enforce?: boolean; env?: NodeJS.ProcessEnv } = {},
): boolean {
  const env = options.env ?? process.env;
  const mode = env[BUDGET_MODE_VARIABLE];
  const enforce =
    mode === 'enforce' ? true : mode === 'warn' ? false : (options.enforce ?? FIRST_ROUTE_BUDGET_FAILS_BUILD);
  const { ok, lines } = checkBudget(distDir);
  console.log(`First-route JavaScript (sign-in, Today):\n  ${lines.join('\n  ')}`);
  if (ok) return true;
  console.log(
    enforce
      ? `Over the first-route budget (web/budget.ts).`
      : `WARNING: over the first-route budget (web/budget.ts); not failing while ` +
          `FIRST_ROUTE_BUDGET_FAILS_BUILD is false (${BUDGET_MODE_VARIABLE}=enforce fails).`,
  );
  return !enforce;
}

// `npm run budget -w web`: the check on the last build, exit 1 when over budget (FIRST_ROUTE_BUDGET=warn aside).
if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const distDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), 'dist');
  if (!existsSync(manifestPath(distDir))) {
    console.error(`No ${manifestPath(distDir)}: run \`npm run build -w web\` first.`);
    process.exit(1);
  }
  process.exit(reportBudget(distDir, { enforce: true }) ? 0 : 1);
}
