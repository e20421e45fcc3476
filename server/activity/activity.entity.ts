import { Column, Entity, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';
import type { ActivityAction, ActivityChange, ActivitySubject } from '../../shared/schemas/activity';

@Entity({ name: 'activity' })
export class ActivityEntry {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar') subject: ActivitySubject;
  @Column('varchar', { name: 'subject_id' }) subjectId: string;
  @Column('varchar', { name: 'subject_name' }) subjectName: string;
  /** The job a job or run entry belongs to, so that a job lists its runs' changes too. */
  @Column('varchar', { name: 'job_id', nullable: true }) jobId: string | null;
  @Column('varchar') action: ActivityAction;
  @Column('simple-json') changes: ActivityChange[];
  @Column('varchar', { name: 'user_id', nullable: true }) userId: string | null;
  @Column('varchar', { name: 'user_name', nullable: true }) userName: string | null;
  @Column(columnType.time) at: Date;
}
