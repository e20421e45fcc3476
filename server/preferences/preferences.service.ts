import { DEFAULT_PREFERENCES, type Preferences } from '../../shared/schemas/preferences';
import type { PreferencesRepository } from './preferences.repository';

export class PreferencesService {
  constructor(private readonly repo: PreferencesRepository) {}

  async get(userId: string): Promise<Preferences> {
    const row = await this.repo.find(userId);
    return row ? { unitSystem: row.unitSystem } : { ...DEFAULT_PREFERENCES };
  }

  async set(userId: string, preferences: Preferences): Promise<Preferences> {
    await this.repo.save({ userId, unitSystem: preferences.unitSystem, updatedAt: new Date() });
    return this.get(userId);
  }
}
