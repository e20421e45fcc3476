import type { DataSource, Repository } from 'typeorm';
import { CacheStamps } from '../cache/cache-stamps.repository';
import { CurrencyRate } from './currency-rate.entity';

export class CurrencyRatesRepository {
  private readonly repo: Repository<CurrencyRate>;

  constructor(dataSource: DataSource) {
    this.repo = dataSource.getRepository(CurrencyRate);
  }

  all() {
    return this.repo.find({ order: { from: 'ASC', to: 'ASC' } });
  }

  /** Moves on every change of a rate, in the change's own transaction (job answers are cached by it). */
  stamp(): Promise<number> {
    return new CacheStamps(this.repo.manager).read('currency_rates');
  }

  save(row: CurrencyRate) {
    return this.repo.manager.transaction(async (m) => {
      const saved = await m.save(m.create(CurrencyRate, row));
      await new CacheStamps(m).bump('currency_rates');
      return saved;
    });
  }

  async remove(from: string, to: string): Promise<boolean> {
    return this.repo.manager.transaction(async (m) => {
      const removed = ((await m.delete(CurrencyRate, { from, to })).affected ?? 0) > 0;
      if (removed) await new CacheStamps(m).bump('currency_rates');
      return removed;
    });
  }
}
