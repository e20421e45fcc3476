import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A counter per kind of cached data: every write to that data bumps it in the same transaction. */
@Entity({ name: 'cache_stamp' })
export class CacheStamp {
  @PrimaryColumn('varchar') name: string;
  @Column('integer') stamp: number;
}
