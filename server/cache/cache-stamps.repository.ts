import type { EntityManager } from 'typeorm';
import { rawRows } from '../db/raw-sql';
import { CacheStamp } from './cache-stamp.entity';

export type StampName = 'catalogue' | 'flex_parts' | 'currency_rates' | 'jobs';

/** Reads and bumps the stamps; bind it to a write's transaction so the bump commits with the change. */
export class CacheStamps {
  constructor(private readonly m: EntityManager) {}

  async read(name: StampName): Promise<number> {
    const [row] = await rawRows<{ stamp: number | string }>(this.m, 'SELECT stamp FROM cache_stamp WHERE name = ?', [name]);
    return row ? Number(row.stamp) : 0;
  }

  async bump(name: StampName): Promise<void> {
    await this.m.createQueryBuilder().insert().into(CacheStamp).values({ name, stamp: 0 }).orIgnore().updateEntity(false).execute();
    await this.m
      .createQueryBuilder()
      .update(CacheStamp)
      .set({ stamp: () => 'stamp + 1' })
      .where('name = :name', { name })
      .updateEntity(false)
      .execute();
  }
}
