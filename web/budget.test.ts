import { randomBytes } from 'node:crypto';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterEach, describe, expect, it } from 'vitest';
import { FIRST_ROUTES, measureFirstRoutes, reportBudget, staticClosure, type ViteManifest } from './budget';

// A manifest shaped as Vite writes it (https://vite.dev/guide/backend-integration: `file`, `isEntry`,
// `imports` for static imports, `dynamicImports` for lazy ones).
const manifest: ViteManifest = {
  'index.html': { file: 'assets/index.js', isEntry: true, imports: ['_react.js'] },
  '_react.js': { file: 'assets/react.js' },
  '_charts.js': { file: 'assets/charts.js' },
  '_form.js': { file: 'assets/form.js', imports: ['_react.js'] },
  [FIRST_ROUTES['sign-in']]: { file: 'assets/sign-in.js', imports: ['_form.js', '_react.js'] },
  [FIRST_ROUTES.today]: { file: 'assets/today.js', imports: ['_form.js'] },
};
(manifest['index.html'] as { dynamicImports?: string[] }).dynamicImports = ['_charts.js'];

let dir: string | undefined;
afterEach(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
  dir = undefined;
});

function dist(sizes: Record<string, number>): string {
  dir = mkdtempSync(path.join(tmpdir(), 'driftmark-budget-'));
  mkdirSync(path.join(dir, '.vite'), { recursive: true });
  mkdirSync(path.join(dir, 'assets'), { recursive: true });
  writeFileSync(path.join(dir, '.vite', 'manifest.json'), JSON.stringify(manifest));
  for (const chunk of Object.values(manifest)) {
    // Random bytes do not compress, so gzip ≈ raw and the sizes given are what the budget sees.
    const body = randomBytes(sizes[chunk.file] ?? 100);
    writeFileSync(path.join(dir, chunk.file), body);
  }
  return dir;
}

describe('first-route budget', () => {
  it('counts the entry, the route and their static imports once each, never the lazy chunks', () => {
    expect(staticClosure(manifest, ['index.html', FIRST_ROUTES['sign-in']])).toEqual([
      'assets/index.js',
      'assets/react.js',
      'assets/sign-in.js',
      'assets/form.js',
    ]);
  });

  it('sums the sizes per route, reading the .gz beside a file when the build wrote one', () => {
    const d = dist({});
    writeFileSync(path.join(d, 'assets', 'react.js.gz'), gzipSync(Buffer.alloc(10)));
    const [signIn] = measureFirstRoutes(d);
    expect(signIn!.route).toBe('sign-in');
    expect(signIn!.raw).toBe(400);
    expect(signIn!.gzip).toBeLessThan(signIn!.raw + 4 * 30);
  });

  it('fails over budget unless failing is off', () => {
    const d = dist({ 'assets/today.js': 200_000 });
    expect(reportBudget(d, { enforce: true, env: {} })).toBe(false);
    expect(reportBudget(d, { enforce: false, env: {} })).toBe(true);
    expect(reportBudget(d, { env: { FIRST_ROUTE_BUDGET: 'enforce' } })).toBe(false);
    expect(reportBudget(d, { enforce: true, env: { FIRST_ROUTE_BUDGET: 'warn' } })).toBe(true);
  });
});
