import { Column, Entity, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';
import type { FixedPointId } from '../../shared/jobs/fixed-points';
import type { Joint, JobStatus, NearbyItem, Support } from '../../shared/schemas/jobs';
import type { Segment } from '../../shared/engine/types';

@Entity({ name: 'job' })
export class Job {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar') name: string;
  @Column('varchar') customer: string;
  @Column('varchar') application: string;
  @Column('varchar') status: JobStatus;
  @Column('text', { default: '' }) notes: string;
  @Column('varchar', { name: 'created_by', nullable: true }) createdBy: string | null;
  // Set by the service, not TypeORM: a change to any run touches its job too.
  @Column(columnType.time, { name: 'created_at' }) createdAt: Date;
  @Column(columnType.time, { name: 'updated_at' }) updatedAt: Date;
}

/** A length of tube between two fixed points. Results are never stored: they are computed on every read. */
@Entity({ name: 'job_run' })
export class JobRun {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'job_id' }) jobId: string;
  /** 1..n within the job, hottest first as the shop builds. */
  @Column('integer') position: number;
  @Column('varchar') name: string;
  @Column('varchar', { name: 'alloy_id' }) alloyId: string;
  @Column(columnType.real, { name: 'od_mm' }) odMm: number;
  @Column(columnType.real, { name: 'wall_mm' }) wallMm: number;
  @Column(columnType.real, { name: 'install_temp_c' }) installTempC: number;
  @Column('simple-json') segments: Segment[];
  @Column('varchar', { name: 'start_fixing' }) startFixing: FixedPointId;
  @Column('varchar', { name: 'end_fixing' }) endFixing: FixedPointId;
  @Column('varchar', { name: 'start_flange_alloy_id', nullable: true }) startFlangeAlloyId: string | null;
  @Column('varchar', { name: 'end_flange_alloy_id', nullable: true }) endFlangeAlloyId: string | null;
  @Column('simple-json') joint: Joint;
  @Column('simple-json', { default: '[]' }) supports: Support[];
  @Column('simple-json', { default: '[]' }) nearby: NearbyItem[];
  @Column('text', { default: '' }) notes: string;
  @Column(columnType.time, { name: 'created_at' }) createdAt: Date;
  @Column(columnType.time, { name: 'updated_at' }) updatedAt: Date;
}
