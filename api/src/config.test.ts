import { describe, expect, it } from 'vitest';
import { loadConfig } from './config.js';

const base = { DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db', JWT_SECRET: 'x'.repeat(32) };

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
      sessionTtlMinutes: 15,
      sessionMaxDays: 30,
    });
    expect(c.smtpUrl).toBeUndefined();
    expect(c.mailCaptureDir).toBeUndefined();
    expect(c.webDist).toMatch(/web[/\\]dist$/);
    expect(c.uploadsDir).toMatch(/uploads-dev$/);
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

  it('treats empty variables as unset', () => {
    const c = loadConfig({ ...base, PORT: '', APP_MODE: '', SMTP_URL: '', MAIL_CAPTURE_DIR: '' });
    expect(c.port).toBe(3000);
    expect(c.appMode).toBe('development');
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
        SESSION_TTL_MINUTES: '0',
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
      'SESSION_TTL_MINUTES',
    ]) {
      expect(message).toContain(`- ${name}:`);
    }
    expect(message).toContain('at least 32 characters');
  });
});
