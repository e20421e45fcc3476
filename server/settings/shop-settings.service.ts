import type { DataSource, Repository } from 'typeorm';
import { DEMO_SHOP_SETTINGS, shopSettingsSchema, type ShopSettings } from '../../shared/schemas/shop-settings';
import { ShopSettingsRow } from './shop-settings.entity';

const ROW_ID = 'shop';

/** The shop's quoting rules: demo values until an admin saves the shop's own. */
export class ShopSettingsService {
  private readonly repo: Repository<ShopSettingsRow>;

  constructor(dataSource: DataSource) {
    this.repo = dataSource.getRepository(ShopSettingsRow);
  }

  async get(): Promise<ShopSettings> {
    const stored = (await this.repo.findOneBy({ id: ROW_ID }))?.value;
    // Settings saved before a field existed take that field's default.
    return stored ? shopSettingsSchema.parse(stored) : DEMO_SHOP_SETTINGS;
  }

  async save(value: ShopSettings, userName: string): Promise<ShopSettings> {
    const saved = await this.repo.save(this.repo.create({ id: ROW_ID, value: { ...value, isDemo: false }, updatedBy: userName }));
    return saved.value;
  }
}
