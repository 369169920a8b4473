import { describe, expect, it } from 'vitest';
import {
  assertDatabaseName,
  clusterLayout,
  isPostgresExe,
  judgePostmaster,
  parsePidFile,
  type PostmasterFacts,
} from './postgres.js';

const dataDir = '/work/main/.data/pg/data';
const pidFileText = `4242\n${dataDir}\n1733100000\n54329\n/work/main/.data/pg/run\n127.0.0.1\n  54329001         0\nready   \n`;

describe('parsePidFile', () => {
  it('reads pid, data folder, port and socket folder', () => {
    expect(parsePidFile(pidFileText)).toEqual({
      pid: 4242,
      dataDir,
      port: 54329,
      socketDir: '/work/main/.data/pg/run',
    });
  });

  it('accepts a pid file written before the port line', () => {
    expect(parsePidFile(`4242\n${dataDir}\n`)).toMatchObject({ pid: 4242, port: undefined });
  });

  it.each(['', '\n', 'abc\n', '-5\n', '0\n'])('rejects %j', (text) => {
    expect(parsePidFile(text)).toBeNull();
  });
});

describe('isPostgresExe', () => {
  it.each([
    ['/usr/lib/postgresql/15/bin/postgres', true],
    ['/usr/lib/postgresql/17/bin/postgres (deleted)', true],
    ['/usr/local/pgsql/bin/postmaster', true],
    ['/usr/bin/node', false],
    ['/usr/bin/postgres-exporter', false],
    [null, false],
  ])('%s → %s', (exe, expected) => {
    expect(isPostgresExe(exe)).toBe(expected);
  });
});

describe('judgePostmaster', () => {
  const running: PostmasterFacts = {
    pidFileText,
    exe: '/usr/lib/postgresql/15/bin/postgres',
    cwd: dataDir,
    dataDir,
    ready: 0,
  };

  // Each row changes one fact of a healthy running server.
  it.each<[string, Partial<PostmasterFacts>, ReturnType<typeof judgePostmaster>]>([
    ['a healthy server', {}, 'running'],
    ['no pid file', { pidFileText: null, exe: null, cwd: null, ready: null }, 'absent'],
    ['a malformed pid file', { pidFileText: 'garbage\n' }, 'stale'],
    ['a dead pid (SIGKILL, reboot)', { exe: null, cwd: null, ready: null }, 'stale'],
    ['a pid recycled by another program', { exe: '/usr/bin/sleep', cwd: '/', ready: null }, 'stale'],
    ['another cluster reusing the pid', { cwd: '/var/lib/postgresql/15/main', ready: 2 }, 'stale'],
    ['another cluster that even answers', { cwd: '/var/lib/postgresql/15/main', ready: 0 }, 'stale'],
    ['our server starting up', { ready: 1 }, 'busy'],
    ['our server not answering yet', { ready: 2 }, 'busy'],
    ['an unknown cwd and no answer', { cwd: null, ready: 2 }, 'stale'],
    ['an unknown cwd but an answer', { cwd: null, ready: 0 }, 'running'],
  ])('%s → %s', (_label, change, expected) => {
    expect(judgePostmaster({ ...running, ...change })).toBe(expected);
  });
});

describe('assertDatabaseName', () => {
  it.each(['driftmark', 'driftmark_test', '_x1'])('accepts %s', (name) => {
    expect(() => assertDatabaseName(name)).not.toThrow();
  });
  it.each(['', 'Driftmark', 'drift-mark', '1db', 'a;drop', 'x'.repeat(64)])('rejects %j', (name) => {
    expect(() => assertDatabaseName(name)).toThrow(/Invalid database name/);
  });
});

describe('clusterLayout', () => {
  it('keeps every cluster file under <data>/pg', () => {
    expect(clusterLayout('/var/tmp/driftmark-0123456789ab')).toEqual({
      clusterDir: '/var/tmp/driftmark-0123456789ab/pg',
      dataDir: '/var/tmp/driftmark-0123456789ab/pg/data',
      socketDir: '/var/tmp/driftmark-0123456789ab/pg/run',
      portFile: '/var/tmp/driftmark-0123456789ab/pg/port',
      passwordFile: '/var/tmp/driftmark-0123456789ab/pg/password',
      logFile: '/var/tmp/driftmark-0123456789ab/pg/postgres.log',
    });
  });
});
