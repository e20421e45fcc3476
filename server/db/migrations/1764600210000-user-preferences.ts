import type { MigrationInterface, QueryRunner } from 'typeorm';

export class UserPreferences1764600210000 implements MigrationInterface {
  name = 'UserPreferences1764600210000';

  async up(q: QueryRunner): Promise<void> {
    // A row only once a user chooses; no row reads as the defaults.
    await q.query(`CREATE TABLE "user_preference" (
      "user_id" varchar PRIMARY KEY NOT NULL REFERENCES "app_user"("id") ON DELETE CASCADE,
      "unit_system" varchar NOT NULL CHECK ("unit_system" IN ('metric','imperial')),
      "updated_at" datetime NOT NULL
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "user_preference"`);
  }
}
