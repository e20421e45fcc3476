import { Column, Entity, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';

@Entity({ name: 'sign_in_address' })
export class SignInAddress {
  @PrimaryColumn('varchar', { name: 'user_id' }) userId: string;
  @PrimaryColumn('varchar', { name: 'address_hash' }) addressHash: string;
  @Column(columnType.time, { name: 'last_success_at' }) lastSuccessAt: Date;
}
