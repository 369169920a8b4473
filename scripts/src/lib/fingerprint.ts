import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';

const SKIPPED_DIRS = new Set(['node_modules', 'dist', '.git', '.vite', 'coverage']);

/** Every file under the given paths (files or folders), skipping build output and dependencies. */
export function listFiles(paths: readonly string[]): string[] {
  const files: string[] = [];
  const walk = (entry: string): void => {
    if (!existsSync(entry)) return;
    const stat = statSync(entry);
    if (stat.isFile()) {
      files.push(entry);
      return;
    }
    if (!stat.isDirectory()) return;
    for (const child of readdirSync(entry)) {
      if (SKIPPED_DIRS.has(child) || child.endsWith('.tsbuildinfo')) continue;
      walk(path.join(entry, child));
    }
  };
  for (const entry of paths) walk(entry);
  return files.sort();
}

/**
 * A cheap fingerprint of build inputs: path, size and mtime of every file. Unlike "newest mtime", it
 * also changes when a file is deleted or renamed, or when a checkout restores an older mtime.
 */
export function fingerprint(paths: readonly string[], baseDir: string): string {
  const hash = createHash('sha256');
  for (const file of listFiles(paths)) {
    const stat = statSync(file);
    hash.update(`${path.relative(baseDir, file)}\0${stat.size}\0${Math.trunc(stat.mtimeMs)}\n`);
  }
  return hash.digest('hex');
}

export interface BuildCheck {
  /** Inputs (files or folders) of the build. */
  inputs: readonly string[];
  /** Files the build must have produced; a missing one forces a rebuild. */
  outputs: readonly string[];
  /** Where the fingerprint of the last successful build is kept (inside the output folder). */
  stampFile: string;
  baseDir: string;
}

export function isBuildFresh(check: BuildCheck): boolean {
  if (!check.outputs.every((output) => existsSync(output))) return false;
  if (!existsSync(check.stampFile)) return false;
  return readFileSync(check.stampFile, 'utf8').trim() === fingerprint(check.inputs, check.baseDir);
}

export function recordBuild(check: BuildCheck): void {
  writeFileSync(check.stampFile, `${fingerprint(check.inputs, check.baseDir)}\n`);
}
