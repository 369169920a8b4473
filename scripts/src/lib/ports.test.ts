import net from 'node:net';
import { describe, expect, it } from 'vitest';
import { isPortFree, pickFreePort } from './ports.js';

describe('pickFreePort', () => {
  const taken = (ports: number[]) => async (port: number) => !ports.includes(port);

  it('returns the preferred port when it is free', async () => {
    expect(await pickFreePort(2525, { isFree: taken([]) })).toBe(2525);
  });

  it('skips taken ports', async () => {
    expect(await pickFreePort(2525, { isFree: taken([2525, 2526]) })).toBe(2527);
  });

  it('skips excluded ports even when they are free', async () => {
    expect(await pickFreePort(3000, { isFree: taken([3001]), exclude: [3000] })).toBe(3002);
  });

  it('gives up after the given number of attempts', async () => {
    await expect(pickFreePort(4000, { attempts: 3, isFree: async () => false })).rejects.toThrow(
      'No free port on 127.0.0.1 in 4000-4002.',
    );
  });

  it('never goes past 65535', async () => {
    await expect(pickFreePort(65_535, { isFree: taken([65_535]) })).rejects.toThrow(/65535/);
  });
});

describe('isPortFree', () => {
  it('sees a listening server as taken and a closed one as free', async () => {
    const server = net.createServer();
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as net.AddressInfo;
    expect(await isPortFree(port)).toBe(false);
    await new Promise<void>((resolve) => server.close(() => resolve()));
    expect(await isPortFree(port)).toBe(true);
  });
});
