import { Column, Entity, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';
import type { Preferences } from '../../shared/schemas/preferences';

@Entity({ name: 'user_preference' })
export class UserPreference {
  @PrimaryColumn('varchar', { name: 'user_id' }) userId: string;
  @Column('varchar', { name: 'unit_system' }) unitSystem: Preferences['unitSystem'];
  @Column(columnType.time, { name: 'updated_at' }) updatedAt: Date;
}
