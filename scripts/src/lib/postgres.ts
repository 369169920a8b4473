/**
 * The project's own PostgreSQL cluster, on 127.0.0.1 and a non-default port, with its files under the
 * data folder (see data-root.ts):
 *
 *   <data>/pg/data          PGDATA (initdb: scram-sha-256 on TCP, peer on the local socket)
 *   <data>/pg/run           unix_socket_directories
 *   <data>/pg/port          the port in use (54329 unless that was taken by something else)
 *   <data>/pg/password      password of the `driftmark` role (0600)
 *   <data>/pg/postgres.log  server log (pg_ctl -l)
 *
 * The cluster keeps running after `npm start`/`npm test` exit (the next start then takes ~0.2 s);
 * `npm run db:stop` stops it. Settings are durable: fsync stays on.
 */
import { randomBytes } from 'node:crypto';
import {
  chownSync,
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  readlinkSync,
  rmSync,
  writeFileSync,
  appendFileSync,
} from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { isRoot } from './apt.js';
import { resolveDataRoot } from './data-root.js';
import { log, seconds } from './log.js';
import { ensurePgBinaries, PG_LIB_DIR } from './pg-binaries.js';
import { isPortFree, pickFreePort } from './ports.js';
import { CommandError, run, sleep, type RunResult } from './proc.js';

export const DEFAULT_PORT = 54329;
export const HOST = '127.0.0.1';
export const APP_ROLE = 'driftmark';
const INCLUDE_LINE = "include_if_exists = 'driftmark.conf'";
const STATE_TIMEOUT_MS = 60_000;

export interface ClusterLayout {
  clusterDir: string;
  dataDir: string;
  socketDir: string;
  portFile: string;
  passwordFile: string;
  logFile: string;
}

export function clusterLayout(dataRoot: string): ClusterLayout {
  const clusterDir = path.join(dataRoot, 'pg');
  return {
    clusterDir,
    dataDir: path.join(clusterDir, 'data'),
    socketDir: path.join(clusterDir, 'run'),
    portFile: path.join(clusterDir, 'port'),
    passwordFile: path.join(clusterDir, 'password'),
    logFile: path.join(clusterDir, 'postgres.log'),
  };
}

// ---------------------------------------------------------------------------------------------------
// postmaster.pid judgement (pure)

export interface PidFileInfo {
  pid: number;
  dataDir: string | undefined;
  port: number | undefined;
  socketDir: string | undefined;
}

/** Parses postmaster.pid (line 1 pid, 2 data dir, 4 port, 5 socket dir); null when malformed. */
export function parsePidFile(text: string): PidFileInfo | null {
  const lines = text.split('\n');
  const pid = Number(lines[0]?.trim());
  if (!Number.isInteger(pid) || pid <= 0) return null;
  const port = Number(lines[3]?.trim());
  return {
    pid,
    dataDir: lines[1]?.trim() || undefined,
    port: Number.isInteger(port) && port > 0 ? port : undefined,
    socketDir: lines[4]?.trim() || undefined,
  };
}

/** True for a /proc/PID/exe target that is a PostgreSQL server binary (possibly replaced by an upgrade). */
export function isPostgresExe(exe: string | null): boolean {
  if (!exe) return false;
  return /\/(postgres|postmaster)( \(deleted\))?$/.test(exe);
}

/** pg_isready exit codes: 0 accepting, 1 rejecting (starting/stopping), 2 no response, 3 no attempt. */
export type ReadyCode = 0 | 1 | 2 | 3;

export type PostmasterState =
  | 'absent' // no postmaster.pid
  | 'running' // our server answers
  | 'busy' // our server exists but is starting, recovering or stopping: wait
  | 'stale'; // the pid file is left over (dead or recycled pid): remove it and start

export interface PostmasterFacts {
  /** Contents of postmaster.pid, or null when there is none. */
  pidFileText: string | null;
  /** readlink /proc/PID/exe, or null when the process does not exist. */
  exe: string | null;
  /** readlink /proc/PID/cwd (a postmaster's cwd is its data folder), or null when unknown. */
  cwd: string | null;
  dataDir: string;
  /** pg_isready against the socket and port named in the pid file; null when not asked. */
  ready: ReadyCode | null;
}

export function judgePostmaster(facts: PostmasterFacts): PostmasterState {
  if (facts.pidFileText === null) return 'absent';
  if (!parsePidFile(facts.pidFileText)) return 'stale';
  if (!isPostgresExe(facts.exe)) return 'stale';
  // A postgres binary at that pid whose cwd is elsewhere is somebody else's server reusing the pid.
  const ours = facts.cwd === null ? null : path.resolve(facts.cwd) === path.resolve(facts.dataDir);
  if (ours === false) return 'stale';
  if (facts.ready === 0) return 'running';
  if (facts.ready === 1) return 'busy';
  // No answer: if the process is provably our postmaster, never remove its pid file; wait instead.
  return ours === true ? 'busy' : 'stale';
}

// ---------------------------------------------------------------------------------------------------
// Running the PostgreSQL tools

interface Tools {
  binDir: string;
  /** Database superuser: "postgres" when we are root (tools run as that OS user), else our user name. */
  superuser: string;
  layout: ClusterLayout;
}

function toolEnv(): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = {};
  for (const [key, value] of Object.entries(process.env)) {
    if (!key.startsWith('PG') && !key.startsWith('LC_')) env[key] = value;
  }
  env.LANG = 'C.UTF-8';
  env.LC_ALL = 'C.UTF-8';
  return env;
}

/** Runs a PostgreSQL tool as the postgres OS user (as ourselves when not root), output captured. */
function pgTool(tools: Tools, name: string, args: readonly string[], input?: string): Promise<RunResult> {
  const bin = path.join(tools.binDir, name);
  const [cmd, ...prefix] = isRoot() ? ['runuser', '-u', 'postgres', '--', bin] : [bin];
  return run(cmd as string, [...prefix, ...args], {
    capture: true,
    input,
    env: toolEnv(),
    cwd: tools.layout.clusterDir,
  });
}

async function pgToolChecked(tools: Tools, name: string, args: readonly string[], input?: string) {
  const result = await pgTool(tools, name, args, input);
  if (result.code !== 0) throw new CommandError(`${name} ${args.join(' ')}`, result);
  return result;
}

function chownToPostgres(target: string): void {
  if (!isRoot()) return;
  const { uid, gid } = postgresIds();
  chownSync(target, uid, gid);
}

let postgresIdCache: { uid: number; gid: number } | undefined;
function postgresIds(): { uid: number; gid: number } {
  if (postgresIdCache) return postgresIdCache;
  const line = readFileSync('/etc/passwd', 'utf8')
    .split('\n')
    .find((entry) => entry.startsWith('postgres:'));
  const [, , uid, gid] = line?.split(':') ?? [];
  if (!uid || !gid) throw new Error('There is no "postgres" OS user (it comes with the postgresql package).');
  postgresIdCache = { uid: Number(uid), gid: Number(gid) };
  return postgresIdCache;
}

function readLink(file: string): string | null {
  try {
    return readlinkSync(file);
  } catch {
    return null;
  }
}

function readText(file: string): string | null {
  try {
    return readFileSync(file, 'utf8');
  } catch {
    return null;
  }
}

/** Pids of processes whose working folder is `dir` (postgres backends chdir to PGDATA). */
function processesIn(dir: string): number[] {
  const pids: number[] = [];
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    if (readLink(`/proc/${entry}/cwd`) === dir) pids.push(Number(entry));
  }
  return pids;
}

function logTail(file: string, lines = 20): string {
  const text = readText(file);
  return text ? text.trimEnd().split('\n').slice(-lines).join('\n') : '(no log)';
}

// ---------------------------------------------------------------------------------------------------
// Cluster life cycle

async function observe(tools: Tools): Promise<{ state: PostmasterState; pidInfo: PidFileInfo | null }> {
  const { dataDir, socketDir } = tools.layout;
  const pidFileText = readText(path.join(dataDir, 'postmaster.pid'));
  const pidInfo = pidFileText === null ? null : parsePidFile(pidFileText);
  let exe: string | null = null;
  let cwd: string | null = null;
  let ready: ReadyCode | null = null;
  if (pidInfo) {
    exe = readLink(`/proc/${pidInfo.pid}/exe`);
    cwd = readLink(`/proc/${pidInfo.pid}/cwd`);
    if (isPostgresExe(exe) && pidInfo.port) {
      const result = await pgTool(tools, 'pg_isready', [
        '-q',
        '-t',
        '3',
        '-h',
        pidInfo.socketDir || socketDir,
        '-p',
        String(pidInfo.port),
      ]);
      ready = ([0, 1, 2, 3] as const).find((code) => code === result.code) ?? 2;
    }
  }
  return { state: judgePostmaster({ pidFileText, exe, cwd, dataDir, ready }), pidInfo };
}

async function removeStaleFiles(tools: Tools, pidInfo: PidFileInfo | null, port: number): Promise<void> {
  const { dataDir, socketDir } = tools.layout;
  // Backends of a killed postmaster notice its death and exit within moments; wait for them first.
  const deadline = Date.now() + 10_000;
  while (processesIn(dataDir).length > 0) {
    if (Date.now() > deadline) {
      throw new Error(
        `Processes ${processesIn(dataDir).join(', ')} still use ${dataDir} although no server answers; ` +
          'stop them and try again.',
      );
    }
    await sleep(200);
  }
  rmSync(path.join(dataDir, 'postmaster.pid'), { force: true });
  for (const candidate of new Set([port, pidInfo?.port].filter((p): p is number => p !== undefined))) {
    rmSync(path.join(socketDir, `.s.PGSQL.${candidate}`), { force: true });
    rmSync(path.join(socketDir, `.s.PGSQL.${candidate}.lock`), { force: true });
  }
}

function writeSettings(tools: Tools, port: number): void {
  const conf = path.join(tools.layout.dataDir, 'driftmark.conf');
  writeFileSync(
    conf,
    [
      '# Written by scripts/src/lib/postgres.ts on every start; edit that file, not this one.',
      "listen_addresses = '127.0.0.1'",
      `port = ${port}`,
      `unix_socket_directories = '${tools.layout.socketDir}'`,
      // Durable: the cluster `npm start` serves must not lose acknowledged commits on a crash.
      'fsync = on',
      'synchronous_commit = on',
      'full_page_writes = on',
      "password_encryption = 'scram-sha-256'",
      "timezone = 'UTC'",
      "log_timezone = 'UTC'",
      '',
    ].join('\n'),
  );
  chownToPostgres(conf);
}

async function initCluster(tools: Tools): Promise<void> {
  const { dataDir } = tools.layout;
  const started = Date.now();
  const base = [
    '-D',
    dataDir,
    '-U',
    tools.superuser,
    '--auth-local=peer',
    '--auth-host=scram-sha-256',
    '-E',
    'UTF8',
    '--locale=C.UTF-8',
    '--data-checksums',
    '--no-instructions',
  ];
  // ICU's root collation sorts names the way people expect ("adam" before "Zed", "Émile" near "Emil").
  let result = await pgTool(tools, 'initdb', [...base, '--locale-provider=icu', '--icu-locale=und']);
  if (result.code !== 0) {
    rmSync(dataDir, { recursive: true, force: true });
    mkdirSync(dataDir, { mode: 0o700 });
    chownToPostgres(dataDir);
    result = await pgTool(tools, 'initdb', base);
  }
  if (result.code !== 0) throw new CommandError('initdb', result);
  log(`Created a PostgreSQL cluster in ${dataDir} (${seconds(Date.now() - started)}).`);
}

function readPort(layout: ClusterLayout): number | undefined {
  const port = Number(readText(layout.portFile)?.trim());
  return Number.isInteger(port) && port > 0 && port < 65_536 ? port : undefined;
}

async function startServer(tools: Tools): Promise<number> {
  const { layout } = tools;
  const preferred = readPort(layout) ?? DEFAULT_PORT;
  const port = (await isPortFree(preferred, HOST)) ? preferred : await pickFreePort(preferred + 1);
  if (port !== preferred) log(`Port ${preferred} is taken by another program; the cluster uses ${port}.`);
  writeFileSync(layout.portFile, `${port}\n`);
  writeSettings(tools, port);
  const result = await pgTool(tools, 'pg_ctl', [
    '-D',
    layout.dataDir,
    '-l',
    layout.logFile,
    '-w',
    '-t',
    '60',
    'start',
  ]);
  if (result.code !== 0) {
    throw new Error(
      `PostgreSQL did not start (pg_ctl exit ${result.code}). Last lines of ${layout.logFile}:\n` +
        logTail(layout.logFile),
    );
  }
  return port;
}

/** Brings the cluster to "running" and returns its port. Idempotent; safe after a crash or reboot. */
async function bringUp(tools: Tools): Promise<{ port: number; action: 'reused' | 'started' }> {
  const deadline = Date.now() + STATE_TIMEOUT_MS;
  let attemptedStart = false;
  for (;;) {
    const { state, pidInfo } = await observe(tools);
    if (state === 'running' && pidInfo?.port) {
      return { port: pidInfo.port, action: attemptedStart ? 'started' : 'reused' };
    }
    if (Date.now() > deadline) {
      throw new Error(
        `PostgreSQL in ${tools.layout.dataDir} is ${state} and does not answer. Last log lines:\n` +
          logTail(tools.layout.logFile),
      );
    }
    if (state === 'busy') {
      await sleep(250);
      continue;
    }
    if (attemptedStart) {
      throw new Error(
        `PostgreSQL started but is ${state}. Last log lines:\n${logTail(tools.layout.logFile)}`,
      );
    }
    if (state === 'stale') {
      log(
        `Removing a stale postmaster.pid (pid ${pidInfo?.pid ?? '?'} is not a running server of this cluster).`,
      );
      await removeStaleFiles(tools, pidInfo, readPort(tools.layout) ?? DEFAULT_PORT);
    }
    attemptedStart = true;
    try {
      await startServer(tools);
    } catch (error) {
      // Another command may have started it at the same moment: look again before giving up.
      if ((await observe(tools)).state !== 'running') throw error;
    }
  }
}

function ensurePassword(layout: ClusterLayout): string {
  const existing = readText(layout.passwordFile)?.trim();
  if (existing && /^[A-Za-z0-9_-]{24,}$/.test(existing)) return existing;
  const password = randomBytes(24).toString('base64url');
  writeFileSync(layout.passwordFile, `${password}\n`, { mode: 0o600 });
  return password;
}

/** Picks the binaries that match an existing cluster's major version (PG_VERSION) when installed. */
function binariesFor(dataDir: string, newestBinDir: string): string {
  const major = readText(path.join(dataDir, 'PG_VERSION'))?.trim();
  if (!major) return newestBinDir;
  const matching = path.join(PG_LIB_DIR, major, 'bin');
  if (existsSync(path.join(matching, 'postgres'))) return matching;
  throw new Error(
    `The cluster in ${dataDir} was created by PostgreSQL ${major}, which is not installed ` +
      `(found ${newestBinDir}). Install postgresql-${major}, or delete ${path.dirname(dataDir)} to start over (its data is lost).`,
  );
}

export interface Cluster {
  host: string;
  port: number;
  user: string;
  password: string;
  dataRoot: string;
  layout: ClusterLayout;
  /** Runs SQL (psql script syntax, \gexec allowed) as the database superuser over the local socket. */
  adminPsql(sql: string): Promise<string>;
}

let current: Cluster | undefined;

async function prepare(): Promise<Tools> {
  const newest = await ensurePgBinaries();
  const dataRoot = (await resolveDataRoot()).dir;
  const layout = clusterLayout(dataRoot);
  for (const dir of [layout.clusterDir, layout.dataDir, layout.socketDir]) {
    mkdirSync(dir, { recursive: true, mode: 0o700 });
    chownToPostgres(dir);
  }
  return {
    binDir: binariesFor(layout.dataDir, newest),
    superuser: isRoot() ? 'postgres' : os.userInfo().username,
    layout,
  };
}

/** Creates (first time), starts (when not running) and returns the project's cluster. */
export async function ensureCluster(): Promise<Cluster> {
  if (current) return current;
  const started = Date.now();
  const tools = await prepare();
  if (!existsSync(path.join(tools.layout.dataDir, 'PG_VERSION'))) await initCluster(tools);
  const mainConf = path.join(tools.layout.dataDir, 'postgresql.conf');
  if (!readText(mainConf)?.includes(INCLUDE_LINE)) appendFileSync(mainConf, `\n${INCLUDE_LINE}\n`);
  const { port, action } = await bringUp(tools);
  if (readPort(tools.layout) !== port) writeFileSync(tools.layout.portFile, `${port}\n`);

  const adminPsql = async (sql: string): Promise<string> => {
    const args = ['-X', '-q', '-A', '-t', '-v', 'ON_ERROR_STOP=1', '-h', tools.layout.socketDir];
    args.push('-p', String(port), '-U', tools.superuser, '-d', 'postgres', '-f', '-');
    const result = await pgToolChecked(tools, 'psql', args, sql);
    return result.stdout.trim();
  };

  const password = ensurePassword(tools.layout);
  // The password goes through stdin, never argv (visible in ps). It is base64url, so quoting is safe.
  await adminPsql(`DO $$
BEGIN
  IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname = '${APP_ROLE}') THEN
    CREATE ROLE ${APP_ROLE} LOGIN CREATEDB PASSWORD '${password}';
  ELSE
    ALTER ROLE ${APP_ROLE} LOGIN CREATEDB PASSWORD '${password}';
  END IF;
END $$;`);

  current = {
    host: HOST,
    port,
    user: APP_ROLE,
    password,
    dataRoot: path.dirname(tools.layout.clusterDir),
    layout: tools.layout,
    adminPsql,
  };
  const verb = action === 'reused' ? 'already running' : 'started';
  log(`PostgreSQL ${verb} on ${HOST}:${port} (${tools.layout.dataDir}, ${seconds(Date.now() - started)}).`);
  return current;
}

/** Database names we create: plain lower-case identifiers, so they never need quoting tricks. */
export function assertDatabaseName(name: string): void {
  if (!/^[a-z_][a-z0-9_]{0,62}$/.test(name)) throw new Error(`Invalid database name "${name}".`);
}

/** Creates database `name` owned by the driftmark role if missing; `fresh` drops and recreates it. */
export async function ensureDatabase(name: string, options: { fresh?: boolean } = {}): Promise<string> {
  assertDatabaseName(name);
  const cluster = await ensureCluster();
  const drop = options.fresh ? `DROP DATABASE IF EXISTS ${name} WITH (FORCE);\n` : '';
  await cluster.adminPsql(
    `${drop}SELECT 'CREATE DATABASE ${name} OWNER ${APP_ROLE}' ` +
      `WHERE NOT EXISTS (SELECT FROM pg_database WHERE datname = '${name}')\\gexec\n`,
  );
  return databaseUrl(name);
}

/** postgres://driftmark:…@127.0.0.1:<port>/<name>; call ensureCluster() first. */
export function databaseUrl(name: string): string {
  assertDatabaseName(name);
  if (!current) throw new Error('databaseUrl() needs ensureCluster() to have run first.');
  return `postgres://${APP_ROLE}:${encodeURIComponent(current.password)}@${current.host}:${current.port}/${name}`;
}

/** Stops the cluster if (and only if) it is verifiably running; used by `npm run db:stop`. */
export async function stopCluster(): Promise<boolean> {
  const tools = await prepare();
  const { state } = await observe(tools);
  current = undefined;
  if (state !== 'running' && state !== 'busy') return false;
  await pgToolChecked(tools, 'pg_ctl', ['-D', tools.layout.dataDir, '-m', 'fast', '-w', '-t', '60', 'stop']);
  return true;
}
