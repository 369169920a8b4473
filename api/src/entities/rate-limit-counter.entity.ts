import { Column, Entity, Index } from 'typeorm';
import { BaseRecord } from './base.entity.js';

/**
 * One rate-limit window of one key (limiter prefix + client address, or address + e-mail). Kept in
 * PostgreSQL so limits survive a restart and hold across instances (middleware/rate-limit.ts).
 */
@Entity({ name: 'rate_limit_counters' })
export class RateLimitCounter extends BaseRecord {
  @Index('UQ_rate_limit_counters_key', { unique: true })
  @Column({ name: 'key', type: 'varchar', length: 400 })
  key: string;

  /** Requests counted in the current window. */
  @Column({ name: 'hits', type: 'integer' })
  hits: number;

  /** When the current window ends; a later request starts a new one. */
  @Index('IDX_rate_limit_counters_reset_at')
  @Column({ name: 'reset_at', type: 'timestamptz' })
  resetAt: Date;
}
