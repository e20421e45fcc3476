import type { DataSource, Repository } from 'typeorm';
import { CurrencyRate } from './currency-rate.entity';

export class CurrencyRatesRepository {
  private readonly repo: Repository<CurrencyRate>;

  constructor(dataSource: DataSource) {
    this.repo = dataSource.getRepository(CurrencyRate);
  }

  all() {
    return this.repo.find({ order: { from: 'ASC', to: 'ASC' } });
  }

  save(row: CurrencyRate) {
    return this.repo.save(this.repo.create(row));
  }

  async remove(from: string, to: string): Promise<boolean> {
    return ((await this.repo.delete({ from, to })).affected ?? 0) > 0;
  }
}
