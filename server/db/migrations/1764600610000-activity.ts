import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Activity1764600610000 implements MigrationInterface {
  name = 'Activity1764600610000';

  async up(q: QueryRunner): Promise<void> {
    // No foreign keys: the entries outlive a deleted run, which is the point of keeping them.
    await q.query(`CREATE TABLE "activity" (
      "id" varchar PRIMARY KEY NOT NULL,
      "subject" varchar NOT NULL CHECK ("subject" IN ('job','run','quote')),
      "subject_id" varchar NOT NULL,
      "subject_name" varchar NOT NULL,
      "job_id" varchar,
      "action" varchar NOT NULL,
      "changes" text NOT NULL,
      "user_id" varchar,
      "user_name" varchar,
      "at" datetime NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_activity_subject" ON "activity" ("subject", "subject_id")`);
    await q.query(`CREATE INDEX "idx_activity_job" ON "activity" ("job_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "activity"`);
  }
}
