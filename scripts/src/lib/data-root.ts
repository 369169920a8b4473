import { createHash } from 'node:crypto';
import { chmodSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import { isRoot } from './apt.js';
import { ensurePgBinaries } from './pg-binaries.js';
import { run } from './proc.js';
import { repoRoot } from './paths.js';

/** Unix socket paths are limited to 107 bytes; leave room for "/.s.PGSQL.NNNNN.lock". */
const MAX_SOCKET_DIR_LENGTH = 107 - '/.s.PGSQL.65535'.length;

/** Location of the cluster's socket folder inside a data root (see postgres.ts). */
export function socketDirOf(dataRoot: string): string {
  return path.join(dataRoot, 'pg', 'run');
}

/** /var/tmp/driftmark-<first 12 hex of sha1(repo path)>: stable per checkout, outside the checkout. */
export function fallbackDataRoot(repo: string): string {
  const digest = createHash('sha1').update(path.resolve(repo)).digest('hex').slice(0, 12);
  return path.join('/var/tmp', `driftmark-${digest}`);
}

/** "/a/b/c" → ["/", "/a", "/a/b", "/a/b/c"]. */
export function pathChain(dir: string): string[] {
  const chain: string[] = [];
  let current = path.resolve(dir);
  for (;;) {
    chain.unshift(current);
    const parent = path.dirname(current);
    if (parent === current) return chain;
    current = parent;
  }
}

export interface DataRootChoice {
  dir: string;
  reason: string;
}

/**
 * The data folder: <repo>/.data when the PostgreSQL user can reach it (and the socket path fits),
 * else the /var/tmp fallback (e.g. a checkout under /root, mode 0700).
 */
export function chooseDataRoot(repo: string, postgresCanTraverse: boolean): DataRootChoice {
  const inRepo = path.join(repo, '.data');
  if (!postgresCanTraverse) {
    return {
      dir: fallbackDataRoot(repo),
      reason: `the postgres user cannot traverse every folder above ${inRepo}`,
    };
  }
  if (socketDirOf(inRepo).length > MAX_SOCKET_DIR_LENGTH) {
    return { dir: fallbackDataRoot(repo), reason: `the socket path under ${inRepo} would be too long` };
  }
  return { dir: inRepo, reason: 'inside the checkout' };
}

/** Runs `test -x` as the postgres user on every folder of the chain; true when all pass. */
async function postgresCanTraverse(dirs: readonly string[]): Promise<boolean> {
  const result = await run(
    'runuser',
    ['-u', 'postgres', '--', 'sh', '-c', 'for d do test -x "$d" || exit 1; done', 'sh', ...dirs],
    { capture: true, cwd: '/' },
  );
  return result.code === 0;
}

let cached: DataRootChoice | undefined;

/** Resolves (and creates) the data folder that holds the cluster, the JWT secret and captured mail. */
export async function resolveDataRoot(): Promise<DataRootChoice> {
  if (cached) return cached;
  let choice: DataRootChoice;
  if (isRoot()) {
    await ensurePgBinaries(); // creates the postgres user on a fresh machine
    // .data itself is ours (made 0755 below); what matters is every folder above it.
    choice = chooseDataRoot(repoRoot, await postgresCanTraverse(pathChain(repoRoot)));
  } else {
    // Not root: PostgreSQL runs as the current user, who can reach the checkout by definition.
    choice = chooseDataRoot(repoRoot, true);
  }
  mkdirSync(choice.dir, { recursive: true, mode: 0o755 });
  chmodSync(choice.dir, 0o755);
  cached = choice;
  return choice;
}
