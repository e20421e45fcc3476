import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Catalogue1764600100000 implements MigrationInterface {
  name = 'Catalogue1764600100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "source" (
      "id" varchar PRIMARY KEY NOT NULL,
      "key" varchar UNIQUE,
      "kind" varchar NOT NULL CHECK ("kind" IN ('standard','handbook','datasheet','memory')),
      "title" varchar NOT NULL,
      "issuer" varchar NOT NULL DEFAULT (''),
      "edition" varchar NOT NULL DEFAULT (''),
      "url" varchar,
      "note" varchar NOT NULL DEFAULT (''),
      "datasheet_id" varchar,
      "created_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "alloy" (
      "id" varchar PRIMARY KEY NOT NULL,
      "uns" varchar NOT NULL UNIQUE,
      "status" varchar NOT NULL CHECK ("status" IN ('draft','published','retired')),
      "published_version_id" varchar,
      "draft_version_id" varchar,
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "alloy_version" (
      "id" varchar PRIMARY KEY NOT NULL,
      "alloy_id" varchar NOT NULL REFERENCES "alloy"("id") ON DELETE CASCADE,
      "version" integer NOT NULL,
      "state" varchar NOT NULL CHECK ("state" IN ('draft','published','superseded')),
      "designation" varchar NOT NULL,
      "uns" varchar NOT NULL,
      "family" varchar NOT NULL,
      "density_kg_m3" real NOT NULL,
      "density_source_id" varchar NOT NULL REFERENCES "source"("id"),
      "max_continuous_c" real NOT NULL,
      "max_intermittent_c" real NOT NULL,
      "limits_source_id" varchar NOT NULL REFERENCES "source"("id"),
      "price_per_kg" real NOT NULL,
      "currency" varchar NOT NULL,
      "price_set_on" varchar NOT NULL,
      "price_is_demo" boolean NOT NULL DEFAULT (0),
      "reference_temp_c" real NOT NULL,
      "notes" text NOT NULL DEFAULT (''),
      "warning_ranges" text NOT NULL,
      "created_by" varchar,
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "published_by" varchar,
      "published_at" datetime
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_alloy_version_number" ON "alloy_version" ("alloy_id", "version")`);
    await q.query(`CREATE TABLE "property_point" (
      "id" varchar PRIMARY KEY NOT NULL,
      "version_id" varchar NOT NULL REFERENCES "alloy_version"("id") ON DELETE CASCADE,
      "kind" varchar NOT NULL CHECK ("kind" IN ('cte','modulus','yield')),
      "temp_c" real NOT NULL,
      "value" real NOT NULL,
      "source_id" varchar NOT NULL REFERENCES "source"("id")
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_property_point" ON "property_point" ("version_id", "kind", "temp_c")`);
    await q.query(`CREATE TABLE "alloy_revision" (
      "id" varchar PRIMARY KEY NOT NULL,
      "alloy_id" varchar NOT NULL REFERENCES "alloy"("id") ON DELETE CASCADE,
      "version" integer,
      "action" varchar NOT NULL,
      "user_id" varchar,
      "user_name" varchar,
      "note" varchar NOT NULL DEFAULT (''),
      "diff" text NOT NULL,
      "at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE INDEX "idx_alloy_revision_alloy" ON "alloy_revision" ("alloy_id")`);
    await q.query(`CREATE TABLE "datasheet" (
      "id" varchar PRIMARY KEY NOT NULL,
      "alloy_id" varchar NOT NULL REFERENCES "alloy"("id") ON DELETE CASCADE,
      "original_name" varchar NOT NULL,
      "stored_name" varchar NOT NULL UNIQUE,
      "size_bytes" integer NOT NULL,
      "sha256" varchar NOT NULL,
      "uploaded_by" varchar,
      "uploaded_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "flex_part" (
      "id" varchar PRIMARY KEY NOT NULL,
      "code" varchar NOT NULL UNIQUE,
      "name" varchar NOT NULL,
      "bore_mm" real NOT NULL,
      "live_length_mm" real NOT NULL,
      "rated_axial_compression_mm" real NOT NULL,
      "rated_axial_extension_mm" real NOT NULL,
      "lateral_offset_mm" real NOT NULL,
      "max_temp_c" real NOT NULL,
      "price" real NOT NULL,
      "currency" varchar NOT NULL,
      "active" boolean NOT NULL DEFAULT (1),
      "is_demo" boolean NOT NULL DEFAULT (0),
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['flex_part', 'datasheet', 'alloy_revision', 'property_point', 'alloy_version', 'alloy', 'source']) {
      await q.query(`DROP TABLE "${table}"`);
    }
  }
}
