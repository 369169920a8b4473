import net from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FACTORY_PASSWORD } from '../factories/password.js';
import { createOwner } from '../factories/users.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';

/**
 * A TCP relay in front of the test PostgreSQL: `down()` closes the port and cuts every open
 * connection (what a database restart looks like to the pool), `up()` listens on the same port again.
 */
class Relay {
  private server: net.Server | null = null;
  private readonly sockets = new Set<net.Socket>();
  port = 0;

  constructor(
    private readonly targetHost: string,
    private readonly targetPort: number,
  ) {}

  async up(): Promise<void> {
    const server = net.createServer((client) => {
      const upstream = net.connect(this.targetPort, this.targetHost);
      for (const s of [client, upstream]) {
        this.sockets.add(s);
        s.on('close', () => this.sockets.delete(s));
        s.on('error', () => {
          client.destroy();
          upstream.destroy();
        });
      }
      client.pipe(upstream).pipe(client);
    });
    await new Promise<void>((resolve) => server.listen(this.port, '127.0.0.1', resolve));
    this.port = (server.address() as net.AddressInfo).port;
    this.server = server;
  }

  async down(): Promise<void> {
    const server = this.server;
    this.server = null;
    const closed = new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
    for (const s of this.sockets) s.destroy();
    await closed;
  }
}

describe('a database outage', () => {
  let t: TestApp;
  let relay: Relay;

  beforeAll(async () => {
    const target = new URL(process.env.DATABASE_URL!);
    relay = new Relay(target.hostname, Number(target.port || 5432));
    await relay.up();
    const viaRelay = new URL(target);
    viaRelay.hostname = '127.0.0.1';
    viaRelay.port = String(relay.port);
    t = await buildTestApp({ databaseUrl: viaRelay.toString() });
  });
  afterAll(async () => {
    await relay.down();
    await t.close();
  });

  it('answers 503 db_unavailable with Retry-After while the database is away, and recovers by itself', async () => {
    const owner = await createOwner(t.dataSource);
    const agent = await signedIn(t.app, owner.email, FACTORY_PASSWORD);
    expect((await agent.get('/api/me')).status).toBe(200);

    await relay.down();
    // A read and a write, both needing the database (the session row first of all).
    for (const res of [
      await agent.get('/api/me'),
      await agent.patch('/api/me/settings').send({ weightUnit: 'lb' }),
    ]) {
      expect(res.status).toBe(503);
      expect(res.headers['retry-after']).toMatch(/^\d+$/);
      expect(res.body).toEqual({
        error: {
          code: 'db_unavailable',
          message: expect.any(String),
          requestId: res.headers['x-request-id'],
        },
      });
    }

    await relay.up();
    const back = await agent.get('/api/me');
    expect(back.status).toBe(200);
    expect(back.headers['retry-after']).toBeUndefined();
  });

  it('answers 503, not 500, when the pool has been closed', async () => {
    const other = await buildTestApp();
    const owner = await createOwner(other.dataSource);
    const agent = await signedIn(other.app, owner.email, FACTORY_PASSWORD);
    await other.dataSource.destroy();
    const res = await agent.get('/api/me');
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('db_unavailable');
    expect(res.headers['retry-after']).toMatch(/^\d+$/);
    await request(other.app).get('/api/health').expect(503);
  });
});
