import { spawn, type ChildProcess, type StdioOptions } from 'node:child_process';
import { closeSync, existsSync, openSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { repoRoot } from './paths.js';

export interface RunOptions {
  cwd?: string;
  /** Full environment of the child; defaults to this process's environment. */
  env?: NodeJS.ProcessEnv;
  /** Written to the child's stdin (stdin is otherwise inherited). */
  input?: string;
  /** Capture stdout/stderr instead of inheriting them. */
  capture?: boolean;
}

export interface RunResult {
  code: number | null;
  signal: NodeJS.Signals | null;
  stdout: string;
  stderr: string;
}

export class CommandError extends Error {
  constructor(
    readonly command: string,
    readonly result: RunResult,
  ) {
    const detail = (result.stderr || result.stdout).trim().split('\n').slice(-15).join('\n');
    super(`${command} failed (${result.signal ?? `exit ${result.code}`})${detail ? `:\n${detail}` : ''}`);
    this.name = 'CommandError';
  }
}

export function describeCommand(cmd: string, args: readonly string[]): string {
  const short = cmd === process.execPath ? 'node' : cmd;
  return [short, ...args.map((arg) => (/^[\w@%+=:,./-]+$/.test(arg) ? arg : JSON.stringify(arg)))].join(' ');
}

/** Runs a command to completion. Never throws for a non-zero exit; see runChecked. */
export function run(cmd: string, args: readonly string[], options: RunOptions = {}): Promise<RunResult> {
  return new Promise((resolve, reject) => {
    const stdio: StdioOptions = [
      options.input !== undefined ? 'pipe' : 'inherit',
      options.capture ? 'pipe' : 'inherit',
      options.capture ? 'pipe' : 'inherit',
    ];
    const child = spawn(cmd, args, { cwd: options.cwd ?? repoRoot, env: options.env ?? process.env, stdio });
    let stdout = '';
    let stderr = '';
    child.stdout?.setEncoding('utf8').on('data', (chunk: string) => (stdout += chunk));
    child.stderr?.setEncoding('utf8').on('data', (chunk: string) => (stderr += chunk));
    child.on('error', reject);
    child.on('close', (code, signal) => resolve({ code, signal, stdout, stderr }));
    if (options.input !== undefined) child.stdin?.end(options.input);
  });
}

/** Runs a command and throws a CommandError (with the output's tail) unless it exits 0. */
export async function runChecked(
  cmd: string,
  args: readonly string[],
  options: RunOptions = {},
): Promise<RunResult> {
  const result = await run(cmd, args, options);
  if (result.code !== 0) throw new CommandError(describeCommand(cmd, args), result);
  return result;
}

/** Succeeds when `sh -c 'command -v NAME'` finds the program. */
export async function hasCommand(name: string): Promise<boolean> {
  const result = await run('/bin/sh', ['-c', 'command -v "$1"', 'sh', name], { capture: true });
  return result.code === 0;
}

/**
 * Path of an npm package's executable, found by walking up from `fromDir` through node_modules folders
 * (so web/node_modules/vite wins over the root one for the web workspace).
 */
export function packageBin(pkg: string, binName?: string, fromDir: string = repoRoot): string {
  let dir = path.resolve(fromDir);
  for (;;) {
    const manifest = path.join(dir, 'node_modules', pkg, 'package.json');
    if (existsSync(manifest)) {
      const json = JSON.parse(readFileSync(manifest, 'utf8')) as { bin?: string | Record<string, string> };
      const bin =
        typeof json.bin === 'string' ? json.bin : json.bin?.[binName ?? pkg.split('/').pop() ?? pkg];
      if (!bin) throw new Error(`Package ${pkg} has no executable ${binName ?? ''}`.trim());
      return path.join(path.dirname(manifest), bin);
    }
    const parent = path.dirname(dir);
    if (parent === dir) throw new Error(`Package ${pkg} is not installed (looked upwards from ${fromDir}).`);
    dir = parent;
  }
}

/** The npm CLI as [command, ...prefixArgs]: this node binary plus npm-cli.js under `npm run`. */
export function npmCommand(): [string, ...string[]] {
  const execPath = process.env.npm_execpath;
  if (execPath && /npm-cli\.js$/.test(execPath)) return [process.execPath, execPath];
  return ['npm'];
}

export interface ServiceExit {
  code: number | null;
  signal: NodeJS.Signals | null;
}

export interface Service {
  readonly name: string;
  readonly child: ChildProcess;
  /** Resolves when the process has exited. */
  readonly exited: Promise<ServiceExit>;
  readonly hasExited: () => boolean;
  /** Signals the process group, waits up to `timeoutMs`, then SIGKILLs the group. */
  stop(signal?: NodeJS.Signals, timeoutMs?: number): Promise<ServiceExit>;
}

const liveServices = new Set<Service>();
let exitHookInstalled = false;

function signalGroup(pid: number | undefined, signal: NodeJS.Signals): void {
  if (!pid) return;
  try {
    process.kill(-pid, signal);
  } catch {
    // Already gone.
  }
}

export interface ServiceOptions {
  cwd?: string;
  env?: NodeJS.ProcessEnv;
  /** Append stdout and stderr to this file instead of inheriting the terminal. */
  logFile?: string;
  /** Open an IPC channel (the child can `process.send`). */
  ipc?: boolean;
}

/**
 * Starts a long-running child in its own process group. Terminal signals (Ctrl-C) then do not reach it
 * directly: the orchestrator decides when and how to stop it, so a graceful shutdown sees exactly one
 * SIGINT. If this process exits unexpectedly, remaining services get SIGTERM.
 */
export function startService(
  name: string,
  cmd: string,
  args: readonly string[],
  options: ServiceOptions = {},
): Service {
  let logFd: number | undefined;
  let stdio: StdioOptions = ['ignore', 'inherit', 'inherit'];
  if (options.logFile) {
    logFd = openSync(options.logFile, 'a');
    stdio = ['ignore', logFd, logFd];
  }
  if (options.ipc) stdio = [...(stdio as unknown[]), 'ipc'] as StdioOptions;

  const child = spawn(cmd, args, {
    cwd: options.cwd ?? repoRoot,
    env: options.env ?? process.env,
    stdio,
    detached: true,
  });
  if (logFd !== undefined) closeSync(logFd);

  let exitInfo: ServiceExit | undefined;
  const exited = new Promise<ServiceExit>((resolve) => {
    child.on('exit', (code, signal) => {
      exitInfo = { code, signal };
      liveServices.delete(service);
      resolve(exitInfo);
    });
    child.on('error', (error) => {
      exitInfo = { code: 127, signal: null };
      liveServices.delete(service);
      console.error(`[driftmark] ${name}: ${error.message}`);
      resolve(exitInfo);
    });
  });

  const service: Service = {
    name,
    child,
    exited,
    hasExited: () => exitInfo !== undefined,
    async stop(signal: NodeJS.Signals = 'SIGTERM', timeoutMs = 10_000) {
      if (exitInfo) return exitInfo;
      signalGroup(child.pid, signal);
      const timer = setTimeout(() => signalGroup(child.pid, 'SIGKILL'), timeoutMs);
      const result = await exited;
      clearTimeout(timer);
      // Grandchildren (e.g. behind a watcher) may outlive the leader; make sure the group is gone.
      signalGroup(child.pid, 'SIGKILL');
      return result;
    },
  };
  liveServices.add(service);

  if (!exitHookInstalled) {
    exitHookInstalled = true;
    process.on('exit', () => {
      for (const live of liveServices) signalGroup(live.child.pid, 'SIGTERM');
    });
  }
  return service;
}

/**
 * Calls `onSignal` once on the first SIGINT/SIGTERM/SIGHUP; later signals are ignored (Ctrl-C usually
 * arrives twice: from the terminal and forwarded by bootstrap.mjs).
 */
export function onShutdownSignal(onSignal: (signal: NodeJS.Signals) => void): void {
  let fired = false;
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
    process.on(signal, () => {
      if (fired) return;
      fired = true;
      onSignal(signal);
    });
  }
}

export function sleep(ms: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, ms));
}
