import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { buildDataSourceOptions } from '../database/database.options';
import { WriteLock } from '../persistence/write-lock';
import { DatabaseThrottlerStorage } from './database-throttler-storage';
import { RateLimitWindow } from './rate-limit-window.entity';

const WINDOW_MS = 60_000;
const T0_MS = Date.UTC(2026, 11, 4, 9, 0, 0);

// On its own SQLite file; the PostgreSQL run covers the storage through the e2e suites.
describe.skipIf(Boolean(process.env.DATABASE_URL))('DatabaseThrottlerStorage', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'loftwright-throttle-'));
  let dataSource: DataSource;
  let storage: DatabaseThrottlerStorage;
  const at = (ms: number) => vi.spyOn(Date, 'now').mockReturnValue(ms);

  beforeAll(async () => {
    dataSource = await new DataSource(buildDataSourceOptions(dataDir)).initialize();
    storage = new DatabaseThrottlerStorage(dataSource, new WriteLock(dataSource));
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });
  afterAll(async () => {
    await dataSource.destroy();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('counts in a window that starts at the first request and blocks past the limit until it ends', async () => {
    at(T0_MS);
    const first = [
      await storage.increment('a', WINDOW_MS, 2),
      await storage.increment('a', WINDOW_MS, 2),
      await storage.increment('a', WINDOW_MS, 2),
    ];
    expect(first.map((count) => [count.totalHits, count.isBlocked])).toEqual([
      [1, false],
      [2, false],
      [3, true],
    ]);
    expect(first[2]).toMatchObject({ timeToExpire: 60, timeToBlockExpire: 60 });
    at(T0_MS + 59_500);
    expect(await storage.increment('a', WINDOW_MS, 2)).toMatchObject({
      totalHits: 4,
      isBlocked: true,
      timeToBlockExpire: 1,
    });
    at(T0_MS + WINDOW_MS);
    expect(await storage.increment('a', WINDOW_MS, 2)).toMatchObject({
      totalHits: 1,
      isBlocked: false,
      timeToExpire: 60,
      timeToBlockExpire: 0,
    });
  });

  it('keeps each key’s count apart', async () => {
    at(T0_MS);
    await storage.increment('b', WINDOW_MS, 5);
    expect((await storage.increment('c', WINDOW_MS, 5)).totalHits).toBe(1);
    expect((await storage.increment('b', WINDOW_MS, 5)).totalHits).toBe(2);
  });

  it('deletes windows that ended, at most every ten minutes', async () => {
    at(T0_MS + 20 * WINDOW_MS);
    await storage.increment('d', WINDOW_MS, 5);
    const keys = (await dataSource.getRepository(RateLimitWindow).find()).map((row) => row.key);
    expect(keys).toEqual(['d']);
  });
});
