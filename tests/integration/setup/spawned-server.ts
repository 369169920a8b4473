import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import net from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { APP_ORIGIN } from './config.js';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');

export interface SpawnedServer {
  child: ChildProcess;
  port: number;
  /** Everything the server printed so far (JSON log lines). */
  output(): string;
  /** Resolves with the exit code (or the signal's name) once the process has ended. */
  exited: Promise<number | string>;
}

/**
 * The real server process (api/src/server.ts through tsx) against the test database on a free
 * port, with the test configuration; resolves once it logs that it is listening.
 */
export async function spawnServer(
  env: Record<string, string> = {},
  /** `pinned`: the same start under the clock in env.PINNED_NOW (setup/pinned-server.ts). */
  entry: 'server' | 'pinned' = 'server',
): Promise<SpawnedServer> {
  // Its own photo folder: the start sweep must never judge the repo's uploads-dev by the test database.
  const uploadsDir = mkdtempSync(path.join(os.tmpdir(), 'driftmark-spawned-uploads-'));
  const script =
    entry === 'pinned'
      ? path.join(repoRoot, 'tests', 'integration', 'setup', 'pinned-server.ts')
      : path.join(repoRoot, 'api', 'src', 'server.ts');
  const child = spawn(process.execPath, ['--import', 'tsx', script], {
    cwd: repoRoot,
    env: {
      ...process.env,
      TSX_TSCONFIG_PATH: path.join(repoRoot, 'api', 'tsconfig.json'),
      APP_MODE: 'test',
      HOST: '127.0.0.1',
      PORT: '0',
      APP_ORIGIN,
      LOG_LEVEL: 'info',
      SMTP_URL: '',
      MAIL_CAPTURE_DIR: '',
      UPLOADS_DIR: uploadsDir,
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  child.stdout!.on('data', (chunk: Buffer) => (out += chunk.toString('utf8')));
  child.stderr!.on('data', (chunk: Buffer) => (out += chunk.toString('utf8')));
  const exited = new Promise<number | string>((resolve) =>
    child.on('exit', (code, signal) => {
      rmSync(uploadsDir, { recursive: true, force: true });
      resolve(code ?? signal ?? 'unknown');
    }),
  );
  const port = await new Promise<number>((resolve, reject) => {
    const check = () => {
      const match = /"url":"http:\/\/127\.0\.0\.1:(\d+)"/.exec(out);
      if (match) {
        child.stdout!.off('data', check);
        resolve(Number(match[1]));
      }
    };
    child.stdout!.on('data', check);
    void exited.then((code) => reject(new Error(`server exited (${code}) before listening:\n${out}`)));
  });
  return { child, port, output: () => out, exited };
}

/** Whether a new TCP connection to the port is refused (nothing listens any more). */
export function connectionRefused(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect(port, '127.0.0.1');
    socket.once('connect', () => {
      socket.destroy();
      resolve(false);
    });
    socket.once('error', (err: NodeJS.ErrnoException) => resolve(err.code === 'ECONNREFUSED'));
  });
}

/** Polls (every 20 ms, at most `attempts` times) until `check` holds; throws if it never does. */
export async function eventually(check: () => Promise<boolean> | boolean, attempts = 500): Promise<void> {
  for (let i = 0; i < attempts; i++) {
    if (await check()) return;
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  throw new Error('condition never held');
}

/** A raw HTTP/1.1 connection: write bytes, read what comes back, see when the server closes it. */
export class RawConnection {
  readonly socket: net.Socket;
  received = '';
  closed = false;
  private readonly ready: Promise<void>;

  constructor(port: number) {
    this.socket = net.connect(port, '127.0.0.1');
    this.socket.setEncoding('utf8');
    this.socket.on('data', (chunk: string) => (this.received += chunk));
    this.socket.on('close', () => (this.closed = true));
    this.socket.on('error', () => {});
    this.ready = new Promise((resolve) => this.socket.once('connect', () => resolve()));
  }

  async write(data: string | Buffer): Promise<void> {
    await this.ready;
    await new Promise<void>((resolve, reject) =>
      this.socket.write(data, (err) => (err ? reject(err) : resolve())),
    );
  }

  /** Waits until the received text matches. */
  async waitFor(pattern: RegExp): Promise<RegExpExecArray> {
    let match: RegExpExecArray | null = null;
    await eventually(() => (match = pattern.exec(this.received)) !== null);
    return match!;
  }

  /** Waits until the server has closed the connection. */
  async waitClosed(): Promise<void> {
    await eventually(() => this.closed);
  }
}
