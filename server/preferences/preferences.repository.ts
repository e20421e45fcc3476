import type { DataSource, Repository } from 'typeorm';
import { UserPreference } from './user-preference.entity';

export class PreferencesRepository {
  private readonly repo: Repository<UserPreference>;

  constructor(dataSource: DataSource) {
    this.repo = dataSource.getRepository(UserPreference);
  }

  find(userId: string) {
    return this.repo.findOneBy({ userId });
  }

  save(row: Pick<UserPreference, 'userId' | 'unitSystem' | 'updatedAt'>) {
    return this.repo.save(this.repo.create(row));
  }
}
