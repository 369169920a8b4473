#!/usr/bin/env node
// Entry point of `npm start`, `npm test`, `npm run dev` and the other root scripts.
//
// This is the project's one plain-JavaScript file on purpose: it runs before node_modules exists, so it
// cannot use tsx or TypeScript. It (1) installs dependencies with `npm ci` when node_modules is missing or
// was installed from a different package-lock.json, then (2) runs `node --import tsx scripts/src/<cmd>.ts`,
// forwarding arguments, stdio, SIGINT/SIGTERM/SIGHUP and the exit code.
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const REPO_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const STAMP_FILE = path.join(REPO_ROOT, 'node_modules', '.driftmark-lock.sha256');
const MIN_NODE = [20, 19];

/** sha256 (hex) of the given file contents. */
export function sha256(contents) {
  return createHash('sha256').update(contents).digest('hex');
}

/**
 * Decides whether `npm ci` must run.
 * @param {{ nodeModulesExists: boolean, lockHash: string, stampHash: string | null }} state
 * @returns {{ install: boolean, reason: string }}
 */
export function installDecision({ nodeModulesExists, lockHash, stampHash }) {
  if (!nodeModulesExists) return { install: true, reason: 'node_modules is missing' };
  if (stampHash === null) return { install: true, reason: 'node_modules has no install stamp' };
  if (stampHash.trim() !== lockHash) return { install: true, reason: 'package-lock.json changed' };
  return { install: false, reason: 'node_modules matches package-lock.json' };
}

/** A command name maps to scripts/src/<name>.ts; only plain kebab-case names are accepted. */
export function isValidCommand(name) {
  return typeof name === 'string' && /^[a-z][a-z0-9-]*$/.test(name);
}

function checkNodeVersion() {
  const [major, minor] = process.versions.node.split('.').map(Number);
  if (major < MIN_NODE[0] || (major === MIN_NODE[0] && minor < MIN_NODE[1])) {
    console.error(`[driftmark] Node ${MIN_NODE.join('.')} or newer is required (found ${process.version}).`);
    process.exit(1);
  }
}

function npmCommand() {
  // Under `npm run`, npm_execpath points at npm's own CLI script: run it with this node binary.
  const execPath = process.env.npm_execpath;
  if (execPath && /npm-cli\.js$/.test(execPath)) return { cmd: process.execPath, prefix: [execPath] };
  return { cmd: 'npm', prefix: [] };
}

function runInherit(cmd, args) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { cwd: REPO_ROOT, stdio: 'inherit' });
    child.on('error', reject);
    child.on('exit', (code, signal) => resolve({ code, signal }));
  });
}

async function ensureDependencies() {
  const lockFile = path.join(REPO_ROOT, 'package-lock.json');
  if (!existsSync(lockFile)) {
    console.error('[driftmark] package-lock.json is missing; cannot run `npm ci`.');
    process.exit(1);
  }
  const lockHash = sha256(readFileSync(lockFile));
  const decision = installDecision({
    nodeModulesExists: existsSync(path.join(REPO_ROOT, 'node_modules')),
    lockHash,
    stampHash: existsSync(STAMP_FILE) ? readFileSync(STAMP_FILE, 'utf8') : null,
  });
  if (!decision.install) return;

  console.log(`[driftmark] Installing dependencies (${decision.reason}): npm ci --no-audit --no-fund`);
  const started = Date.now();
  const npm = npmCommand();
  const result = await runInherit(npm.cmd, [...npm.prefix, 'ci', '--no-audit', '--no-fund']);
  if (result.code !== 0) {
    console.error(`[driftmark] npm ci failed (${result.signal ?? `exit ${result.code}`}).`);
    process.exit(result.code || 1);
  }
  writeFileSync(STAMP_FILE, `${lockHash}\n`);
  console.log(`[driftmark] Dependencies installed in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}

async function main() {
  checkNodeVersion();
  const [command, ...args] = process.argv.slice(2);
  if (!isValidCommand(command)) {
    console.error('[driftmark] Usage: node scripts/bootstrap.mjs <command> [args...]');
    process.exit(2);
  }
  const entry = path.join(REPO_ROOT, 'scripts', 'src', `${command}.ts`);
  if (!existsSync(entry)) {
    console.error(`[driftmark] Unknown command "${command}" (no scripts/src/${command}.ts).`);
    process.exit(2);
  }

  await ensureDependencies();

  const child = spawn(process.execPath, ['--import', 'tsx', entry, ...args], {
    cwd: REPO_ROOT,
    stdio: 'inherit',
  });
  // Ctrl-C reaches the whole foreground process group, so the child usually gets SIGINT twice (once from
  // the terminal, once from here); the commands treat repeated signals as one.
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) {
    process.on(signal, () => {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
    });
  }
  child.on('error', (error) => {
    console.error(`[driftmark] Could not start ${command}: ${error.message}`);
    process.exit(1);
  });
  child.on('exit', (code, signal) => {
    if (signal) {
      // Re-raise so our parent sees the same kind of termination.
      process.removeAllListeners(signal);
      process.kill(process.pid, signal);
      return;
    }
    process.exit(code ?? 1);
  });
}

if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  main().catch((error) => {
    console.error(`[driftmark] ${error instanceof Error ? error.stack : String(error)}`);
    process.exit(1);
  });
}
