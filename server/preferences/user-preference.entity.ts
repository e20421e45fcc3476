import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { Preferences } from '../../shared/schemas/preferences';

@Entity({ name: 'user_preference' })
export class UserPreference {
  @PrimaryColumn('varchar', { name: 'user_id' }) userId: string;
  @Column('varchar', { name: 'unit_system' }) unitSystem: Preferences['unitSystem'];
  @Column('datetime', { name: 'updated_at' }) updatedAt: Date;
}
