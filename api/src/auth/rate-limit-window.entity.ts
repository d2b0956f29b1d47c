import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** bigint comes back from PostgreSQL as text; the times here are milliseconds, well within 2^53. */
const epochMs = {
  to: (value: number): number => value,
  from: (value: unknown): number => Number(value),
};

/**
 * How many requests one client made to one rate-limited route group in its current window, shared
 * by every API instance. The window starts at the first request after the previous one ended.
 */
@Entity('rate_limit_window')
export class RateLimitWindow {
  /** The throttler's key: a hash of the route, the bucket and the client address. */
  @PrimaryColumn('varchar', { length: 128 })
  key: string;

  @Column('bigint', { name: 'window_start_ms', transformer: epochMs })
  windowStartMs: number;

  /** windowStartMs plus the bucket's window; rows past it are reset on use or swept. */
  @Index('rate_limit_window_expires_at')
  @Column('bigint', { name: 'expires_at_ms', transformer: epochMs })
  expiresAtMs: number;

  @Column('integer')
  count: number;
}
