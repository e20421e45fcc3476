import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Jobs1764600200000 implements MigrationInterface {
  name = 'Jobs1764600200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "job" (
      "id" varchar PRIMARY KEY NOT NULL,
      "name" varchar NOT NULL,
      "customer" varchar NOT NULL,
      "application" varchar NOT NULL,
      "status" varchar NOT NULL CHECK ("status" IN ('active','archived')),
      "notes" text NOT NULL DEFAULT (''),
      "created_by" varchar REFERENCES "app_user"("id") ON DELETE SET NULL,
      "created_at" datetime NOT NULL,
      "updated_at" datetime NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_job_status_updated" ON "job" ("status", "updated_at")`);
    // Segments and the joint are small ordered documents read and written whole with their run.
    await q.query(`CREATE TABLE "job_run" (
      "id" varchar PRIMARY KEY NOT NULL,
      "job_id" varchar NOT NULL REFERENCES "job"("id") ON DELETE CASCADE,
      "position" integer NOT NULL CHECK ("position" >= 1),
      "name" varchar NOT NULL,
      "alloy_id" varchar NOT NULL REFERENCES "alloy"("id"),
      "od_mm" real NOT NULL CHECK ("od_mm" > 0),
      "wall_mm" real NOT NULL CHECK ("wall_mm" > 0),
      "install_temp_c" real NOT NULL,
      "segments" text NOT NULL,
      "start_fixing" varchar NOT NULL,
      "end_fixing" varchar NOT NULL,
      "joint" text NOT NULL,
      "notes" text NOT NULL DEFAULT (''),
      "created_at" datetime NOT NULL,
      "updated_at" datetime NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_job_run_job_position" ON "job_run" ("job_id", "position")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "job_run"`);
    await q.query(`DROP TABLE "job"`);
  }
}
