import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CurrencyRates1764600510000 implements MigrationInterface {
  name = 'CurrencyRates1764600510000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "currency_rate" (
      "from_currency" varchar NOT NULL,
      "to_currency" varchar NOT NULL,
      "rate" real NOT NULL CHECK ("rate" > 0),
      "set_by" varchar,
      "set_at" datetime NOT NULL,
      PRIMARY KEY ("from_currency", "to_currency")
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "currency_rate"`);
  }
}
