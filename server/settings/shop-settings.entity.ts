import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { columnType } from '../db/column-types';
import type { ShopSettings } from '../../shared/schemas/shop-settings';

/** One row: the shop's quoting rules. */
@Entity({ name: 'shop_settings' })
export class ShopSettingsRow {
  @PrimaryColumn('varchar') id: string;
  @Column('simple-json') value: ShopSettings;
  @Column('varchar', { name: 'updated_by', nullable: true }) updatedBy: string | null;
  @UpdateDateColumn({ name: 'updated_at', type: columnType.time }) updatedAt: Date;
}
