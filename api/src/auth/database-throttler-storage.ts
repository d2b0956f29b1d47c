import type { ThrottlerStorage } from '@nestjs/throttler';
import type { DataSource, EntityManager } from 'typeorm';
import { LessThanOrEqual } from 'typeorm';
import type { WriteLock } from '../persistence/write-lock';
import { RateLimitWindow } from './rate-limit-window.entity';

/** What the throttler guard needs back from a count (its ThrottlerStorageRecord). */
export interface RateLimitCount {
  totalHits: number;
  /** Seconds until the window ends (X-RateLimit-Reset). */
  timeToExpire: number;
  isBlocked: boolean;
  /** Seconds a blocked client waits (Retry-After): until the window ends. */
  timeToBlockExpire: number;
}

/** How often one instance deletes windows that ended (they are reset on use anyway). */
const SWEEP_INTERVAL_MS = 10 * 60_000;

/**
 * Rate-limit counts kept in the database, so every API instance counts the same requests. Each
 * count is one transaction whose first statement is a write (SQLite takes its write lock there and
 * PostgreSQL locks the row at the first UPDATE), so concurrent requests on any instance each see
 * a distinct, increasing count.
 */
export class DatabaseThrottlerStorage implements ThrottlerStorage {
  private lastSweepMs = 0;

  constructor(
    private readonly dataSource: DataSource,
    private readonly writeLock: WriteLock,
  ) {}

  async increment(key: string, ttlMs: number, limit: number): Promise<RateLimitCount> {
    const nowMs = Date.now();
    const window = await this.writeLock.run(() =>
      this.dataSource.transaction((manager) => this.countRequest(manager, key, ttlMs, nowMs)),
    );
    const secondsLeft = Math.max(1, Math.ceil((window.expiresAtMs - nowMs) / 1000));
    const isBlocked = window.count > limit;
    return {
      totalHits: window.count,
      timeToExpire: secondsLeft,
      isBlocked,
      timeToBlockExpire: isBlocked ? secondsLeft : 0,
    };
  }

  private async countRequest(
    manager: EntityManager,
    key: string,
    ttlMs: number,
    nowMs: number,
  ): Promise<RateLimitWindow> {
    const windows = manager.getRepository(RateLimitWindow);
    const fresh = { windowStartMs: nowMs, expiresAtMs: nowMs + ttlMs, count: 0 };
    // INSERT … ON CONFLICT DO NOTHING (INSERT OR IGNORE on SQLite): the row exists after this.
    await windows
      .createQueryBuilder()
      .insert()
      .values({ key, ...fresh })
      .orIgnore()
      .execute();
    // A window that has ended starts again from this request.
    await windows.update({ key, expiresAtMs: LessThanOrEqual(nowMs) }, fresh);
    await windows.increment({ key }, 'count', 1);
    if (nowMs - this.lastSweepMs >= SWEEP_INTERVAL_MS) {
      this.lastSweepMs = nowMs;
      await windows.delete({ expiresAtMs: LessThanOrEqual(nowMs) });
    }
    return windows.findOneByOrFail({ key });
  }
}
