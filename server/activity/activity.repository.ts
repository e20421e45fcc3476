import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { ActivityAction, ActivityChange, ActivitySubject } from '../../shared/schemas/activity';
import { ActivityEntry } from './activity.entity';

export interface ActivityActor {
  id: string | null;
  name: string;
}

export interface NewActivity {
  subject: ActivitySubject;
  subjectId: string;
  subjectName: string;
  jobId: string | null;
  action: ActivityAction;
  changes?: ActivityChange[];
}

/** Activity rows, written by the repositories of jobs and quotes inside their own transactions. */
export class ActivityRows {
  constructor(private readonly m: EntityManager) {}

  async add(entry: NewActivity, actor: ActivityActor | null): Promise<void> {
    const row = Object.assign(new ActivityEntry(), {
      id: randomUUID(),
      ...entry,
      changes: entry.changes ?? [],
      userId: actor?.id ?? null,
      userName: actor?.name ?? null,
      at: new Date(),
    });
    await this.m.createQueryBuilder().insert().into(ActivityEntry).values(row as never).updateEntity(false).execute();
  }

  /** Newest first: a subject's own entries, or with `jobId` everything of the job and its runs. */
  list(where: { subject: ActivitySubject; subjectId: string } | { jobId: string }): Promise<ActivityEntry[]> {
    return this.m
      .createQueryBuilder(ActivityEntry, 'a')
      .where(where)
      .orderBy('a.at', 'DESC')
      .addOrderBy('a.rowid', 'DESC')
      .limit(500)
      .getMany();
  }
}

