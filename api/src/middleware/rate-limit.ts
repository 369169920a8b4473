import { createHash } from 'node:crypto';
import type { RequestHandler } from 'express';
import {
  ipKeyGenerator,
  rateLimit,
  type ClientRateLimitInfo,
  type Options,
  type Store,
} from 'express-rate-limit';
import type { DataSource } from 'typeorm';
import type { Config } from '../config.js';
import { AppError } from '../errors.js';

const WINDOW_MS = 15 * 60 * 1000;
/** Every this many counted requests, a store removes windows that ended long ago. */
const SWEEP_EVERY = 500;

/**
 * express-rate-limit's counters in PostgreSQL (`rate_limit_counters`), so a restart does not
 * reset them and every instance sees the same counts. One fixed window per key: the first hit
 * opens it, a hit after `reset_at` opens the next. Times are the database's, shared by all
 * instances.
 */
export class PgRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = WINDOW_MS;
  private incrementsSinceSweep = 0;

  constructor(
    private readonly dataSource: DataSource,
    /** Names the limiter; two limiters never share a key. */
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  /**
   * The stored key: the limiter's prefix and a SHA-256 of the client's key. Keys carry what the
   * client typed (an e-mail, read before any validation), which may hold NUL or be very long;
   * PostgreSQL text refuses NUL, and a digest has a fixed length.
   */
  private rowKey(key: string): string {
    return this.prefix + createHash('sha256').update(key).digest('hex');
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows: { hits: number; reset_at: Date }[] = await this.dataSource.query(
      `SELECT hits, reset_at FROM rate_limit_counters WHERE key = $1 AND reset_at > now()`,
      [this.rowKey(key)],
    );
    const row = rows[0];
    return row ? { totalHits: row.hits, resetTime: row.reset_at } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    this.incrementsSinceSweep += 1;
    if (this.incrementsSinceSweep >= SWEEP_EVERY) {
      this.incrementsSinceSweep = 0;
      // Best effort: a failed sweep only leaves old rows for the next one.
      this.sweep().catch(() => undefined);
    }
    const rows: { hits: number; reset_at: Date }[] = await this.dataSource.query(
      `INSERT INTO rate_limit_counters (key, hits, reset_at)
       VALUES ($1, 1, now() + $2 * interval '1 millisecond')
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_counters.reset_at <= now() THEN 1 ELSE rate_limit_counters.hits + 1 END,
         reset_at = CASE WHEN rate_limit_counters.reset_at <= now() THEN EXCLUDED.reset_at
                         ELSE rate_limit_counters.reset_at END,
         updated_at = now()
       RETURNING hits, reset_at`,
      [this.rowKey(key), this.windowMs],
    );
    const row = rows[0]!;
    return { totalHits: row.hits, resetTime: row.reset_at };
  }

  async decrement(key: string): Promise<void> {
    // Runs after the response has gone; a pool closed meanwhile (shutdown) only loses one decrement.
    if (!this.dataSource.isInitialized) return;
    await this.dataSource.query(
      `UPDATE rate_limit_counters SET hits = GREATEST(hits - 1, 0), updated_at = now()
       WHERE key = $1 AND reset_at > now()`,
      [this.rowKey(key)],
    );
  }

  async resetKey(key: string): Promise<void> {
    await this.dataSource.query(`DELETE FROM rate_limit_counters WHERE key = $1`, [this.rowKey(key)]);
  }

  /** Windows that ended a day ago or more; called now and then so the table stays small. */
  async sweep(): Promise<void> {
    await this.dataSource.query(`DELETE FROM rate_limit_counters WHERE reset_at < now() - interval '1 day'`);
  }
}

function limited(message: string): RequestHandler {
  return (_req, _res, next) => next(new AppError('rate_limited', message));
}

const ip = (req: { ip?: string | undefined }): string => ipKeyGenerator(req.ip ?? 'unknown');

/** The four anonymous routes that cost a secret check, each counted per client address. */
export type AddressLimitedRoute = 'sign-in' | 'reset-password' | 'invitation-accept' | 'deletion-confirm';

/**
 * The app's rate limits, their counters in PostgreSQL. Each call makes a new limiter with its own
 * store; the prefix keeps limiters apart in the one table.
 */
export class RateLimits {
  constructor(
    private readonly config: Pick<Config, 'signInRateLimit' | 'resetRateLimit' | 'addressRateLimit'>,
    private readonly dataSource: DataSource,
  ) {}

  private store(prefix: string): PgRateLimitStore {
    return new PgRateLimitStore(this.dataSource, prefix);
  }

  /**
   * Failed sign-in attempts per 15 minutes per IP + e-mail (guessing one account's password).
   * Successful sign-ins don't count, so people and test suites that sign in often are not locked out.
   */
  signIn(): RequestHandler {
    return rateLimit({
      windowMs: WINDOW_MS,
      limit: this.config.signInRateLimit,
      skipSuccessfulRequests: true,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      store: this.store('sign-in:'),
      keyGenerator: (req) => {
        const body: unknown = req.body;
        const raw =
          body && typeof body === 'object' && 'email' in body ? (body as { email: unknown }).email : '';
        const email = typeof raw === 'string' ? raw.trim().toLowerCase().slice(0, 254) : '';
        return `${ip(req)}|${email}`;
      },
      handler: limited('Too many sign-in attempts. Wait a few minutes and try again.'),
    });
  }

  /**
   * Failed attempts per 15 minutes per client address across every account, on one of the routes
   * that check a secret (spraying one password over many e-mails, guessing links, burning CPU).
   */
  perAddress(route: AddressLimitedRoute): RequestHandler {
    return rateLimit({
      windowMs: WINDOW_MS,
      limit: this.config.addressRateLimit,
      skipSuccessfulRequests: true,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      store: this.store(`address:${route}:`),
      keyGenerator: (req) => ip(req),
      handler: limited('Too many attempts from your network. Wait a few minutes and try again.'),
    });
  }

  /** Forgot/reset requests per 15 minutes per IP (mail flooding, token guessing). */
  reset(name: 'forgot' | 'reset'): RequestHandler {
    return rateLimit({
      windowMs: WINDOW_MS,
      limit: this.config.resetRateLimit,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      store: this.store(`${name}:`),
      keyGenerator: (req) => ip(req),
      handler: limited('Too many requests. Wait a few minutes and try again.'),
    });
  }
}
