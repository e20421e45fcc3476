import type { DataSource, Repository } from 'typeorm';
import { DEMO_SHOP_SETTINGS, shopSettingsSchema, type ShopSettings } from '../../shared/schemas/shop-settings';
import { rawRows } from '../db/raw-sql';
import { ShopSettingsRow } from './shop-settings.entity';

const ROW_ID = 'shop';

/** The shop's quoting rules: demo values until an admin saves the shop's own. */
export class ShopSettingsService {
  private readonly repo: Repository<ShopSettingsRow>;
  private parsed: { text: string; value: ShopSettings } | null = null;

  constructor(dataSource: DataSource) {
    this.repo = dataSource.getRepository(ShopSettingsRow);
  }

  /** Read on most requests: the row's text is read plainly and parsed again only when it changed. */
  async get(): Promise<ShopSettings> {
    const [row] = await rawRows<{ value: string }>(this.repo.manager, 'SELECT value FROM shop_settings WHERE id = ?', [ROW_ID]);
    if (!row) return DEMO_SHOP_SETTINGS;
    if (row.value !== this.parsed?.text) {
      // Settings saved before a field existed take that field's default.
      this.parsed = { text: row.value, value: shopSettingsSchema.parse(JSON.parse(row.value)) };
    }
    return structuredClone(this.parsed.value);
  }

  async save(value: ShopSettings, userName: string): Promise<ShopSettings> {
    const saved = await this.repo.save(this.repo.create({ id: ROW_ID, value: { ...value, isDemo: false }, updatedBy: userName }));
    return saved.value;
  }
}
