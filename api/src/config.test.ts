import { describe, expect, it } from 'vitest';
import { loadConfig, loadStorageConfig } from './config.js';

const base = {
  APP_MODE: 'development',
  DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db',
  JWT_SECRET: 'x'.repeat(32),
};
/** A secret as the scripts generate it (48 random bytes, base64url), fixed here. */
const strongSecret = 'q3Vx9LrT0mZbK2wYpHc7NaJf5GdS1eUoRi8Bk4Xt6lQvWnCyEsPjMh-_Az0gIuFD';
const production = { ...base, APP_MODE: 'production', JWT_SECRET: strongSecret };

function problemsOf(env: Record<string, string>): string {
  try {
    loadConfig(env);
    return '';
  } catch (err) {
    return (err as Error).message;
  }
}

describe('loadConfig', () => {
  it('fills the documented defaults', () => {
    const c = loadConfig(base);
    expect(c).toMatchObject({
      appMode: 'development',
      host: '127.0.0.1',
      port: 3000,
      appOrigin: 'http://127.0.0.1:3000',
      extraOrigins: [],
      mailFrom: 'Driftmark <no-reply@driftmark.test>',
      logLevel: 'info',
      signInRateLimit: 10,
      resetRateLimit: 5,
      addressRateLimit: 30,
      sessionRefreshMinutes: 15,
      sessionLifetimes: {
        athlete: { idleMs: 30 * 86_400_000, absoluteMs: 90 * 86_400_000 },
        staff: { idleMs: 12 * 3_600_000, absoluteMs: 14 * 86_400_000 },
      },
      statementCountHeader: false,
    });
    expect(loadConfig({ ...base, STATEMENT_COUNT_HEADER: '1' }).statementCountHeader).toBe(true);
    expect(c.smtpUrl).toBeUndefined();
    expect(c.mailCaptureDir).toBeUndefined();
    expect(c.webDist).toMatch(/web[/\\]dist$/);
    expect(c.uploadsDir).toMatch(/uploads-dev$/);
  });

  it('keeps photos in the folder unless PHOTO_STORAGE=s3 names a bucket', () => {
    expect(loadConfig(base)).toMatchObject({ photoStorage: 'folder' });
    expect(loadConfig(base).s3).toBeUndefined();
    const c = loadConfig({
      ...base,
      PHOTO_STORAGE: 's3',
      S3_BUCKET: 'driftmark-photos',
      S3_ENDPOINT: 'http://127.0.0.1:4569',
      S3_FORCE_PATH_STYLE: '1',
      S3_ACCESS_KEY_ID: 'key',
      S3_SECRET_ACCESS_KEY: 'secret',
    });
    expect(c.photoStorage).toBe('s3');
    expect(c.s3).toEqual({
      bucket: 'driftmark-photos',
      region: 'us-east-1',
      endpoint: 'http://127.0.0.1:4569',
      forcePathStyle: true,
      credentials: { accessKeyId: 'key', secretAccessKey: 'secret' },
    });
    // Without keys the SDK's own chain (environment, profile, instance role) answers.
    const aws = loadConfig({
      ...base,
      PHOTO_STORAGE: 's3',
      S3_BUCKET: 'photos.example',
      S3_REGION: 'eu-north-1',
    });
    expect(aws.s3).toEqual({ bucket: 'photos.example', region: 'eu-north-1', forcePathStyle: false });
    expect(loadStorageConfig({ S3_BUCKET: 'abc' })).toMatchObject({
      photoStorage: 'folder',
      s3: { bucket: 'abc' },
    });
  });

  it('names every bad photo-store setting', () => {
    expect(problemsOf({ ...base, PHOTO_STORAGE: 's3' })).toContain(
      'S3_BUCKET: is required when PHOTO_STORAGE=s3',
    );
    const message = problemsOf({
      ...base,
      PHOTO_STORAGE: 'disk',
      // AWS bucket naming rules: no capitals or underscores, 3-63 characters.
      S3_BUCKET: 'My_Bucket',
      S3_ENDPOINT: 'localhost:9000',
      S3_FORCE_PATH_STYLE: 'yes',
    });
    for (const name of ['PHOTO_STORAGE', 'S3_BUCKET', 'S3_ENDPOINT', 'S3_FORCE_PATH_STYLE'])
      expect(message).toContain(`  - ${name}: `);
    expect(problemsOf({ ...base, S3_BUCKET: 'ab' })).toContain('S3_BUCKET: must be a bucket name');
    expect(problemsOf({ ...base, S3_ACCESS_KEY_ID: 'key' })).toContain(
      'S3_SECRET_ACCESS_KEY: set both S3 keys or neither',
    );
    expect(() => loadStorageConfig({ PHOTO_STORAGE: 's3' })).toThrow(/S3_BUCKET: is required/);
  });

  it('derives the origin from PORT and parses EXTRA_ORIGINS', () => {
    const c = loadConfig({
      ...base,
      PORT: '3456',
      EXTRA_ORIGINS: 'http://127.0.0.1:5173, http://localhost:5173/',
    });
    expect(c.appOrigin).toBe('http://127.0.0.1:3456');
    expect(c.extraOrigins).toEqual(['http://127.0.0.1:5173', 'http://localhost:5173']);
  });

  it('reads TRUST_PROXY as a hop count or a list of proxy addresses, refusing anything else', () => {
    expect(loadConfig(base).trustProxy).toBe(false);
    expect(loadConfig({ ...base, TRUST_PROXY: '' }).trustProxy).toBe(false);
    expect(loadConfig({ ...base, TRUST_PROXY: '1' }).trustProxy).toBe(1);
    expect(loadConfig({ ...base, TRUST_PROXY: 'loopback, 10.0.0.0/8,fd00::1' }).trustProxy).toEqual([
      'loopback',
      '10.0.0.0/8',
      'fd00::1',
    ]);
    for (const bad of ['yes', '10.0.0.0/33', '10.0.0.1/8/8', 'proxy.example.test', ',']) {
      expect(problemsOf({ ...base, TRUST_PROXY: bad })).toMatch(/TRUST_PROXY: must be a number of proxies/);
    }
  });

  it('treats empty variables as unset', () => {
    const c = loadConfig({ ...base, PORT: '', SMTP_URL: '', MAIL_CAPTURE_DIR: '' });
    expect(c.port).toBe(3000);
    expect(c.smtpUrl).toBeUndefined();
  });

  it('names every bad variable in one error', () => {
    let message = '';
    try {
      loadConfig({
        APP_MODE: 'staging',
        PORT: 'eighty',
        JWT_SECRET: 'short',
        APP_ORIGIN: 'http://x.test/path',
        SESSION_REFRESH_MINUTES: '0',
        SESSION_STAFF_IDLE_HOURS: '1.5',
      });
    } catch (err) {
      message = (err as Error).message;
    }
    for (const name of [
      'APP_MODE',
      'PORT',
      'DATABASE_URL',
      'JWT_SECRET',
      'APP_ORIGIN',
      'SESSION_REFRESH_MINUTES',
      'SESSION_STAFF_IDLE_HOURS',
    ]) {
      expect(message).toContain(`- ${name}:`);
    }
    expect(message).toContain('at least 32 characters');
  });

  it('refuses to start without an explicit APP_MODE, empty counting as missing', () => {
    const { APP_MODE: _mode, ...noMode } = base;
    expect(problemsOf(noMode)).toContain(
      '- APP_MODE: is required: one of demo, development, test, production',
    );
    expect(problemsOf({ ...base, APP_MODE: '' })).toContain('- APP_MODE: is required');
  });

  it('accepts a production start with a generated secret and an https origin', () => {
    const c = loadConfig({ ...production, APP_ORIGIN: 'https://app.example.org' });
    expect(c.appMode).toBe('production');
    expect(c.appOrigin).toBe('https://app.example.org');
  });

  it.each([
    ['x'.repeat(40), 'repeated character'],
    ['abcabcabcabcabcabcabcabcabcabcabcabc', 'few distinct characters'],
    ['changeme-changeme-changeme-0123456789', 'placeholder word'],
    ['my-driftmark-jwt-secret-for-production-1234', 'placeholder word'],
  ])('refuses a weak JWT_SECRET in production (%s: %s)', (secret) => {
    const message = problemsOf({ ...production, JWT_SECRET: secret, APP_ORIGIN: 'https://app.example.org' });
    expect(message).toContain('- JWT_SECRET: too weak for production');
  });

  it('refuses a missing JWT_SECRET in production', () => {
    const { JWT_SECRET: _secret, ...noSecret } = production;
    expect(problemsOf({ ...noSecret, APP_ORIGIN: 'https://app.example.org' })).toContain('- JWT_SECRET:');
  });

  it('refuses a missing or http APP_ORIGIN in production unless ALLOW_HTTP_ORIGIN=1 says it is a local run', () => {
    expect(problemsOf(production)).toContain('- APP_ORIGIN: is required in production');
    expect(problemsOf({ ...production, APP_ORIGIN: 'http://app.example.org' })).toContain(
      '- APP_ORIGIN: must be https in production',
    );
    expect(
      problemsOf({ ...production, APP_ORIGIN: 'http://127.0.0.1:3000', ALLOW_HTTP_ORIGIN: '0' }),
    ).toContain('- APP_ORIGIN: must be https in production');
    expect(loadConfig({ ...production, ALLOW_HTTP_ORIGIN: '1' }).appOrigin).toBe('http://127.0.0.1:3000');
    expect(
      loadConfig({ ...production, APP_ORIGIN: 'http://127.0.0.1:4000', ALLOW_HTTP_ORIGIN: '1' }).appOrigin,
    ).toBe('http://127.0.0.1:4000');
  });

  it('keeps weak secrets and http origins working outside production (the scripts generate secrets anyway)', () => {
    expect(loadConfig({ ...base, APP_MODE: 'demo' }).appOrigin).toBe('http://127.0.0.1:3000');
  });
});
