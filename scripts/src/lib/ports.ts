import net from 'node:net';

/** True when nothing listens on host:port (checked by binding it briefly). */
export function isPortFree(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.unref();
    server.once('error', () => resolve(false));
    server.listen({ port, host, exclusive: true }, () => {
      server.close(() => resolve(true));
    });
  });
}

export interface PickPortOptions {
  host?: string;
  /** How many consecutive ports to try, starting at `preferred`. */
  attempts?: number;
  /** Ports that count as taken even if free right now (e.g. already handed to another child). */
  exclude?: readonly number[];
  isFree?: (port: number, host: string) => Promise<boolean>;
}

/** The first free port at or after `preferred`. */
export async function pickFreePort(preferred: number, options: PickPortOptions = {}): Promise<number> {
  const { host = '127.0.0.1', attempts = 100, exclude = [], isFree = isPortFree } = options;
  for (let port = preferred; port < preferred + attempts && port <= 65_535; port += 1) {
    if (exclude.includes(port)) continue;
    if (await isFree(port, host)) return port;
  }
  throw new Error(`No free port on ${host} in ${preferred}-${Math.min(preferred + attempts - 1, 65_535)}.`);
}

/** Waits until host:port accepts TCP connections or `timeoutMs` passes. */
export async function waitForPort(port: number, host = '127.0.0.1', timeoutMs = 15_000): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const open = await new Promise<boolean>((resolve) => {
      const socket = net.connect({ port, host });
      socket.once('connect', () => {
        socket.destroy();
        resolve(true);
      });
      socket.once('error', () => resolve(false));
    });
    if (open) return true;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return false;
}
