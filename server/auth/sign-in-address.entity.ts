import { Column, Entity, PrimaryColumn } from 'typeorm';

@Entity({ name: 'sign_in_address' })
export class SignInAddress {
  @PrimaryColumn('varchar', { name: 'user_id' }) userId: string;
  @PrimaryColumn('varchar', { name: 'address_hash' }) addressHash: string;
  @Column('datetime', { name: 'last_success_at' }) lastSuccessAt: Date;
}
