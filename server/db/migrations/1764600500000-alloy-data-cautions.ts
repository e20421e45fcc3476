import type { MigrationInterface, QueryRunner } from 'typeorm';

/** What a user must know about an alloy's data (limits lowered to the data, values still to be verified). */
export class AlloyDataCautions1764600500000 implements MigrationInterface {
  name = 'AlloyDataCautions1764600500000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "alloy_version" ADD COLUMN "data_cautions" text NOT NULL DEFAULT ''`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "alloy_version" DROP COLUMN "data_cautions"`);
  }
}
