import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { aptInstall } from './apt.js';

export const PG_LIB_DIR = '/usr/lib/postgresql';

function versionKey(name: string): number[] {
  return name.split('.').map((part) => Number.parseInt(part, 10) || 0);
}

/** The highest version among folder names like "15", "9.6", "17" (what `ls -v | tail -n1` picks). */
export function newestVersion(names: readonly string[]): string | undefined {
  return [...names].sort((a, b) => {
    const [ka, kb] = [versionKey(a), versionKey(b)];
    for (let i = 0; i < Math.max(ka.length, kb.length); i += 1) {
      const diff = (ka[i] ?? 0) - (kb[i] ?? 0);
      if (diff !== 0) return diff;
    }
    return 0;
  })[names.length - 1];
}

/** bin folder of the newest installed PostgreSQL server (one with an initdb), if any. */
export function findPgBinDir(libDir = PG_LIB_DIR): string | undefined {
  if (!existsSync(libDir)) return undefined;
  const versions = readdirSync(libDir).filter((name) => existsSync(path.join(libDir, name, 'bin', 'initdb')));
  const newest = newestVersion(versions);
  return newest === undefined ? undefined : path.join(libDir, newest, 'bin');
}

let cached: string | undefined;

/** Finds the PostgreSQL server binaries, installing Debian's `postgresql` package when there are none. */
export async function ensurePgBinaries(): Promise<string> {
  if (cached) return cached;
  let binDir = findPgBinDir();
  if (!binDir) {
    await aptInstall(['postgresql'], `No PostgreSQL server found (${PG_LIB_DIR}/*/bin/initdb)`);
    binDir = findPgBinDir();
    if (!binDir) throw new Error(`Installed postgresql, but still no ${PG_LIB_DIR}/*/bin/initdb.`);
  }
  cached = binDir;
  return binDir;
}
