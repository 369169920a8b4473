import { loadConfig, type Config } from '../../../api/src/config.js';

/**
 * The app configuration for integration tests: the runner supplies DATABASE_URL and JWT_SECRET
 * (scripts/src/test.ts); everything else has test-friendly defaults that a file may override.
 */
/** Ten years. */
const LONG_MS = 10 * 365 * 86_400_000;

export function testConfig(overrides: Partial<Config> = {}): Config {
  const config = loadConfig({
    APP_MODE: 'test',
    LOG_LEVEL: 'silent',
    ...process.env,
  });
  return {
    ...config,
    appOrigin: 'http://127.0.0.1:3000',
    extraOrigins: ['http://127.0.0.1:5173'],
    // Most files sign in many times from one address; the rate-limit file sets low limits itself.
    signInRateLimit: 1000,
    resetRateLimit: 1000,
    addressRateLimit: 1000,
    // Files move their pinned clock by days and months with one sign-in; sessions.test.ts checks the
    // real lifetimes (config.ts defaults) on its own.
    sessionLifetimes: {
      athlete: { idleMs: LONG_MS, absoluteMs: LONG_MS },
      staff: { idleMs: LONG_MS, absoluteMs: LONG_MS },
    },
    smtpUrl: undefined,
    mailCaptureDir: undefined,
    webDist: '/nonexistent/driftmark-web-dist',
    ...overrides,
  };
}

/** The Origin header a browser on the app's own page sends. */
export const APP_ORIGIN = 'http://127.0.0.1:3000';
