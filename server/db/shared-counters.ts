import { RateLimiterPostgres, RateLimiterSQLite, type RateLimiterAbstract } from 'rate-limiter-flexible';
import type { DataSource } from 'typeorm';
import { isPostgres, rawDatabase, rawPool } from './data-source';

/** Counts per key over a fixed window, e.g. failed sign-ins per address. */
export type Counters = (name: string, points: number, durationSeconds: number) => RateLimiterAbstract;

/**
 * Counters kept in the database's `rate_limit` table (migration RateLimits), so every app instance
 * on one PostgreSQL counts together; on SQLite the same table keeps them across restarts.
 */
export function databaseCounters(dataSource: DataSource): Counters {
  return (name, points, duration) => {
    const common = { keyPrefix: name, points, duration, tableName: 'rate_limit', tableCreated: true, clearExpiredByTimeout: false };
    return isPostgres(dataSource)
      ? new RateLimiterPostgres({ ...common, storeClient: rawPool(dataSource), storeType: 'pool' })
      : new RateLimiterSQLite({ ...common, storeClient: rawDatabase(dataSource), storeType: 'better-sqlite3' });
  };
}

/** Drops counters whose window has passed (the stores' own hourly sweep is off: its timer outlives a closed database in tests). */
export async function clearExpiredCounters(dataSource: DataSource): Promise<void> {
  await dataSource.createQueryBuilder().delete().from('rate_limit').where('expire < :now', { now: Date.now() }).execute();
}
