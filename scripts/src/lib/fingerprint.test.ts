import { mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { fingerprint, isBuildFresh, listFiles, recordBuild, type BuildCheck } from './fingerprint.js';

let dir: string;
let check: BuildCheck;

beforeEach(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'fingerprint-'));
  mkdirSync(path.join(dir, 'src'));
  mkdirSync(path.join(dir, 'dist'));
  mkdirSync(path.join(dir, 'node_modules'));
  writeFileSync(path.join(dir, 'src', 'a.ts'), 'export const a = 1;\n');
  writeFileSync(path.join(dir, 'src', 'b.ts'), 'export const b = 2;\n');
  writeFileSync(path.join(dir, 'node_modules', 'ignored.js'), '');
  writeFileSync(path.join(dir, 'dist', 'a.js'), '');
  check = {
    inputs: [dir],
    outputs: [path.join(dir, 'dist', 'a.js')],
    stampFile: path.join(dir, 'dist', '.stamp'),
    baseDir: dir,
  };
});

afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('build fingerprints', () => {
  it('lists sources but not dist or node_modules', () => {
    expect(listFiles([dir]).map((file) => path.relative(dir, file))).toEqual(['src/a.ts', 'src/b.ts']);
  });

  it('is stale before the first build and fresh right after it', () => {
    expect(isBuildFresh(check)).toBe(false);
    recordBuild(check);
    expect(isBuildFresh(check)).toBe(true);
  });

  it('changes when a file is edited, even to an older mtime', () => {
    recordBuild(check);
    utimesSync(path.join(dir, 'src', 'a.ts'), new Date(2000, 0, 1), new Date(2000, 0, 1));
    expect(isBuildFresh(check)).toBe(false);
  });

  it('changes when a file is deleted or added', () => {
    const before = fingerprint([dir], dir);
    rmSync(path.join(dir, 'src', 'b.ts'));
    const afterDelete = fingerprint([dir], dir);
    writeFileSync(path.join(dir, 'src', 'c.ts'), '');
    expect(new Set([before, afterDelete, fingerprint([dir], dir)]).size).toBe(3);
  });

  it('is stale when an output is missing', () => {
    recordBuild(check);
    rmSync(path.join(dir, 'dist', 'a.js'));
    expect(isBuildFresh(check)).toBe(false);
  });
});
