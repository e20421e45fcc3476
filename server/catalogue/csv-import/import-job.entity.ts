import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { ImportPhase, ImportReport } from '../../../shared/catalogue/catalogue-csv';
import { columnType } from '../../db/column-types';

/** One CSV import's progress, where every app instance can read it. */
@Entity({ name: 'import_job' })
export class ImportJobRow {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar') phase: ImportPhase;
  @Column('integer') done: number;
  @Column('integer') total: number;
  /** 'one' while running, NULL after: a UNIQUE index lets one import run at a time across instances. */
  @Column('varchar', { name: 'running_slot', nullable: true }) runningSlot: string | null;
  @Column('varchar', { name: 'started_by', nullable: true }) startedBy: string | null;
  @Column('simple-json', { nullable: true }) report: ImportReport | null;
  @Column('varchar', { nullable: true }) error: string | null;
  @Column(columnType.time, { name: 'started_at' }) startedAt: Date;
  @Column(columnType.time, { name: 'updated_at' }) updatedAt: Date;
  @Column(columnType.time, { name: 'finished_at', nullable: true }) finishedAt: Date | null;
}
