import type { MigrationInterface, QueryRunner } from 'typeorm';

export class UsersAndSessions1764600000000 implements MigrationInterface {
  name = 'UsersAndSessions1764600000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "app_user" (
      "id" varchar PRIMARY KEY NOT NULL,
      "email" varchar NOT NULL UNIQUE,
      "name" varchar NOT NULL,
      "role" varchar NOT NULL CHECK ("role" IN ('admin','engineer','fabricator','sales')),
      "password_hash" varchar NOT NULL,
      "active" boolean NOT NULL DEFAULT (1),
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    // Column names follow lucia's SQLite adapter, which reads this table directly.
    await q.query(`CREATE TABLE "user_session" (
      "id" varchar PRIMARY KEY NOT NULL,
      "user_id" varchar NOT NULL REFERENCES "app_user"("id") ON DELETE CASCADE,
      "expires_at" integer NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_user_session_user" ON "user_session" ("user_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "user_session"`);
    await q.query(`DROP TABLE "app_user"`);
  }
}
