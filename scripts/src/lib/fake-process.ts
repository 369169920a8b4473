/**
 * The process side shared by the fakes' runners (s3-fake.ts, smtp-fake.ts, food-products-fake.ts):
 * reads the port and host from the environment, starts the fake, tells the parent { type: 'ready', port }
 * over IPC, and closes the fake when the parent goes away or a signal arrives.
 */

export interface RunningFake {
  port: number;
  close(): Promise<void>;
}

export interface FakeProcessOptions<F extends RunningFake> {
  /** Log prefix, e.g. 's3-fake'. */
  name: string;
  portEnv: string;
  defaultPort: number;
  hostEnv: string;
  /** Checks the fake's own settings before start; exits 2 on the message it returns. */
  check?: () => string | undefined;
  start: (port: number, host: string) => Promise<F>;
  /** The line logged once the fake listens. */
  listening: (fake: F) => string;
}

function fail(name: string, message: string, code: number): never {
  console.error(`[${name}] ${message}`);
  process.exit(code);
}

export async function runFakeProcess<F extends RunningFake>(options: FakeProcessOptions<F>): Promise<void> {
  const { name, portEnv, hostEnv } = options;
  const port = Number(process.env[portEnv] ?? options.defaultPort);
  const host = process.env[hostEnv] ?? '127.0.0.1';

  const problem = options.check?.();
  if (problem) fail(name, problem, 2);
  if (!Number.isInteger(port) || port < 0 || port > 65_535) {
    fail(name, `${portEnv} must be a port number (got "${process.env[portEnv]}").`, 2);
  }

  let fake: F;
  try {
    fake = await options.start(port, host);
  } catch (error) {
    fail(name, `Could not listen on ${host}:${port}: ${(error as Error).message}`, 1);
  }
  console.log(`[${name}] ${options.listening(fake)}`);
  process.send?.({ type: 'ready', port: fake.port });
  // Without this the open IPC channel would keep a parent-less fake alive forever.
  process.on('disconnect', () => void fake.close().then(() => process.exit(0)));
  let closing = false;
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
    process.on(signal, () => {
      if (closing) return;
      closing = true;
      void fake.close().then(() => process.exit(0));
    });
  }
}
