import 'reflect-metadata';
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp } from '../../../api/src/app.js';
import type { Config } from '../../../api/src/config.js';
import { createDataSource } from '../../../api/src/db/data-source.js';
import { createLogger } from '../../../api/src/logger.js';
import { APP_ORIGIN, testConfig } from './config.js';
import { truncateAll } from './db.js';

export interface TestApp {
  app: Express;
  config: Config;
  dataSource: DataSource;
  /** Empties every table (call in beforeEach/beforeAll). */
  reset(): Promise<void>;
  close(): Promise<void>;
}

/**
 * The real app against the test database, with its own small pool. `clock` pins the app's "now"
 * (e.g. `() => now` with a variable the test moves).
 */
export async function buildTestApp(
  overrides: Partial<Config> = {},
  options: { clock?: () => Date } = {},
): Promise<TestApp> {
  const config = testConfig(overrides);
  const dataSource = await createDataSource(config, { poolSize: 4 }).initialize();
  const app = createApp({ config, dataSource, logger: createLogger('silent'), clock: options.clock });
  return {
    app,
    config,
    dataSource,
    reset: () => truncateAll(dataSource),
    close: async () => {
      if (dataSource.isInitialized) await dataSource.destroy();
    },
  };
}

/** A cookie-keeping client that sends the app's Origin on every request, like the web app. */
export function browser(app: Express): ReturnType<typeof request.agent> {
  return request.agent(app).set('Origin', APP_ORIGIN);
}

/** Signs in through the API and returns the signed-in client. */
export async function signedIn(
  app: Express,
  email: string,
  password: string,
): Promise<ReturnType<typeof request.agent>> {
  const agent = browser(app);
  const res = await agent.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200)
    throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

/** The `dm_session` cookie (name=value) from a response, if it set one. */
export function sessionCookie(res: { headers: Record<string, unknown> }): string | undefined {
  const raw = res.headers['set-cookie'];
  const cookies = Array.isArray(raw) ? (raw as string[]) : typeof raw === 'string' ? [raw] : [];
  const line = cookies.find((c) => c.startsWith('dm_session='));
  return line?.split(';')[0];
}

/** The full Set-Cookie line for `dm_session`, with its attributes. */
export function sessionCookieLine(res: { headers: Record<string, unknown> }): string | undefined {
  const raw = res.headers['set-cookie'];
  const cookies = Array.isArray(raw) ? (raw as string[]) : typeof raw === 'string' ? [raw] : [];
  return cookies.find((c) => c.startsWith('dm_session='));
}
