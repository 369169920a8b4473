import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { pino } from 'pino';
import { describe, expect, it, vi } from 'vitest';
import { runWithRequestId } from './middleware/request-logging.js';
import { exitOnUncaughtException, logUnhandledRejection } from './process-errors.js';

type LogLine = { level: number; msg: string; requestId?: string; origin?: string; err?: { message: string } };

function memoryLogger() {
  const lines: LogLine[] = [];
  const logger = pino({ level: 'info' }, { write: (line: string) => void lines.push(JSON.parse(line)) });
  return { logger, lines };
}

describe('logUnhandledRejection', () => {
  it('logs the reason at error level with the id of the request it came from', () => {
    const { logger, lines } = memoryLogger();
    const handler = logUnhandledRejection(logger);
    runWithRequestId('req-7', () => handler(new Error('rm of a file without a path')));
    handler('a plain string, outside any request');
    expect(lines).toEqual([
      expect.objectContaining({
        level: 50,
        requestId: 'req-7',
        err: expect.objectContaining({ message: 'rm of a file without a path' }),
        msg: expect.stringMatching(/keeps running/),
      }),
      expect.objectContaining({ level: 50, err: 'a plain string, outside any request' }),
    ]);
    expect(lines[1]).not.toHaveProperty('requestId');
  });
});

describe('exitOnUncaughtException', () => {
  it('logs at fatal level and exits 1', () => {
    const { logger, lines } = memoryLogger();
    const exit = vi.fn();
    runWithRequestId('req-8', () =>
      exitOnUncaughtException(logger, exit)(new Error('bang'), 'uncaughtException'),
    );
    expect(exit).toHaveBeenCalledWith(1);
    expect(lines).toEqual([
      expect.objectContaining({
        level: 60,
        requestId: 'req-8',
        origin: 'uncaughtException',
        err: expect.objectContaining({ message: 'bang' }),
      }),
    ]);
  });
});

describe('installProcessErrorHandlers in a real process', () => {
  const here = path.dirname(fileURLToPath(import.meta.url));
  /** Runs a node process that installs the handlers the server installs, then misbehaves. */
  function runChild(misbehave: string) {
    const script = `
      const { createLogger } = await import(${JSON.stringify(path.join(here, 'logger.ts'))});
      const { installProcessErrorHandlers } = await import(${JSON.stringify(path.join(here, 'process-errors.ts'))});
      const { runWithRequestId } = await import(${JSON.stringify(path.join(here, 'middleware', 'request-logging.ts'))});
      installProcessErrorHandlers(createLogger('info'));
      ${misbehave}
    `;
    const result = spawnSync(process.execPath, ['--import', 'tsx', '--input-type=module', '-e', script], {
      encoding: 'utf8',
    });
    const lines = result.stdout
      .split('\n')
      .filter((line) => line.startsWith('{'))
      .map((line) => JSON.parse(line) as LogLine & { alive?: boolean });
    return { status: result.status, lines, stderr: result.stderr };
  }

  it('survives an unhandled rejection (Node alone would exit 1) and logs it with its request id', () => {
    const { status, lines, stderr } = runChild(`
      runWithRequestId('req-42', () => { void Promise.reject(new Error('boom')); });
      // Rejections are reported before the next turn of the event loop.
      setImmediate(() => console.log(JSON.stringify({ alive: true })));
    `);
    expect(status, stderr).toBe(0);
    // The log line and the marker may reach stdout in either order (the logger writes asynchronously).
    expect(lines).toHaveLength(2);
    expect(lines).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          level: 50,
          requestId: 'req-42',
          err: expect.objectContaining({ message: 'boom' }),
        }),
        { alive: true },
      ]),
    );
  });

  it('exits 1 after an uncaught exception, logged as fatal', () => {
    const { status, lines, stderr } = runChild(`
      setImmediate(() => { throw new Error('bang'); });
      setImmediate(() => console.log(JSON.stringify({ alive: true })));
    `);
    expect(status, stderr).toBe(1);
    expect(lines).toEqual([
      expect.objectContaining({ level: 60, err: expect.objectContaining({ message: 'bang' }) }),
    ]);
  });
});
