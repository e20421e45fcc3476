import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { columnType } from '../db/column-types';
import type { Role } from '../../shared/schemas/auth';

@Entity({ name: 'app_user' })
export class User {
  @PrimaryColumn('varchar')
  id: string;

  @Column('varchar', { unique: true })
  email: string;

  @Column('varchar')
  name: string;

  @Column('varchar')
  role: Role;

  @Column('varchar', { name: 'password_hash' })
  passwordHash: string;

  @Column(columnType.flag, { default: true })
  active: boolean;

  @CreateDateColumn({ name: 'created_at', type: columnType.time })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: columnType.time })
  updatedAt: Date;
}
