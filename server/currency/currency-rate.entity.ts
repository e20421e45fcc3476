import { Column, Entity, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';

/** One conversion an admin set: 1 unit of `from` = `rate` units of `to`. */
@Entity({ name: 'currency_rate' })
export class CurrencyRate {
  @PrimaryColumn('varchar', { name: 'from_currency' }) from: string;
  @PrimaryColumn('varchar', { name: 'to_currency' }) to: string;
  @Column(columnType.real) rate: number;
  @Column('varchar', { name: 'set_by', nullable: true }) setBy: string | null;
  @Column(columnType.time, { name: 'set_at' }) setAt: Date;
}
