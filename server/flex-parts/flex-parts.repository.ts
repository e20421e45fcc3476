import type { DataSource, Repository } from 'typeorm';
import { FlexPartRow } from './flex-part.entity';

export class FlexPartsRepository {
  private readonly repo: Repository<FlexPartRow>;

  constructor(dataSource: DataSource) {
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
  save(row: FlexPartRow) {
    return this.repo.save(row);
  }
  create(fields: Partial<FlexPartRow>) {
    return this.repo.create(fields);
  }
}
