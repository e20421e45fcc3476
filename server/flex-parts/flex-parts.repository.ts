import type { DataSource, Repository } from 'typeorm';
import { CacheStamps } from '../cache/cache-stamps.repository';
import { FlexPartRow } from './flex-part.entity';

export class FlexPartsRepository {
  private readonly repo: Repository<FlexPartRow>;

  constructor(private readonly dataSource: DataSource) {
    this.repo = dataSource.getRepository(FlexPartRow);
  }

  list(activeOnly: boolean) {
    return this.repo.find({ where: activeOnly ? { active: true } : {}, order: { boreMm: 'ASC', liveLengthMm: 'ASC' } });
  }
  findById(id: string) {
    return this.repo.findOneBy({ id });
  }
  findByCode(code: string) {
    return this.repo.findOneBy({ code });
  }
  /** Saves the part and bumps the parts' cache stamp in one transaction. */
  save(row: FlexPartRow) {
    return this.dataSource.transaction(async (m) => {
      const saved = await m.save(FlexPartRow, row);
      await new CacheStamps(m).bump('flex_parts');
      return saved;
    });
  }
  stamp() {
    return new CacheStamps(this.dataSource.manager).read('flex_parts');
  }
  create(fields: Partial<FlexPartRow>) {
    return this.repo.create(fields);
  }
}
