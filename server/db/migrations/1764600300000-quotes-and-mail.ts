import type { MigrationInterface, QueryRunner } from 'typeorm';

export class QuotesAndMail1764600300000 implements MigrationInterface {
  name = 'QuotesAndMail1764600300000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "mail_message" (
      "id" varchar PRIMARY KEY NOT NULL,
      "message_id" varchar,
      "from_address" varchar NOT NULL,
      "to_addresses" varchar NOT NULL,
      "subject" varchar NOT NULL,
      "text" text NOT NULL,
      "html" text NOT NULL,
      "size_bytes" integer NOT NULL,
      "received_at" datetime NOT NULL
    )`);
    await q.query(`CREATE TABLE "shop_settings" (
      "id" varchar PRIMARY KEY NOT NULL,
      "value" text NOT NULL,
      "updated_by" varchar,
      "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "quote" (
      "id" varchar PRIMARY KEY NOT NULL,
      "number" varchar NOT NULL UNIQUE,
      "job_id" varchar NOT NULL REFERENCES "job"("id"),
      "customer_name" varchar NOT NULL,
      "customer_email" varchar NOT NULL,
      "customer_company" varchar NOT NULL DEFAULT (''),
      "valid_until" varchar NOT NULL,
      "message" text NOT NULL DEFAULT (''),
      "status" varchar NOT NULL CHECK ("status" IN ('draft','sent','viewed','accepted','declined','expired')),
      "options" text NOT NULL,
      "snapshot" text,
      "token_hash" varchar UNIQUE,
      "accepted_option_index" integer,
      "decided_by" varchar,
      "created_by" varchar,
      "created_at" datetime NOT NULL,
      "updated_at" datetime NOT NULL,
      "sent_at" datetime
    )`);
    await q.query(`CREATE TABLE "quote_event" (
      "id" varchar PRIMARY KEY NOT NULL,
      "quote_id" varchar NOT NULL REFERENCES "quote"("id") ON DELETE CASCADE,
      "status" varchar NOT NULL,
      "note" varchar NOT NULL DEFAULT (''),
      "by" varchar,
      "at" datetime NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_quote_event_quote" ON "quote_event" ("quote_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['quote_event', 'quote', 'shop_settings', 'mail_message']) await q.query(`DROP TABLE "${table}"`);
  }
}
