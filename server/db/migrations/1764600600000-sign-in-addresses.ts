import type { MigrationInterface, QueryRunner } from 'typeorm';

export class SignInAddresses1764600600000 implements MigrationInterface {
  name = 'SignInAddresses1764600600000';

  async up(q: QueryRunner): Promise<void> {
    // Where each user has signed in before (a hash of the address, not the address): failures there slow down rather than lock.
    await q.query(`CREATE TABLE "sign_in_address" (
      "user_id" varchar NOT NULL REFERENCES "app_user"("id") ON DELETE CASCADE,
      "address_hash" varchar NOT NULL,
      "last_success_at" datetime NOT NULL,
      PRIMARY KEY ("user_id", "address_hash")
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "sign_in_address"`);
  }
}
