import type { MigrationInterface, QueryRunner } from 'typeorm';

/** What a flex part is for, its angular and cycle ratings, and the sizes the equivalent-movement check needs. */
export class FlexPartRatings1764600400000 implements MigrationInterface {
  name = 'FlexPartRatings1764600400000';

  async up(q: QueryRunner): Promise<void> {
    // Parts already listed were all sold as thermal bellows; with no angular rating given they take no rotation.
    await q.query(
      `ALTER TABLE "flex_part" ADD COLUMN "purpose" varchar NOT NULL DEFAULT ('thermal_bellows') CHECK ("purpose" IN ('thermal_bellows','vibration_decoupler','braided_hose'))`,
    );
    await q.query(`ALTER TABLE "flex_part" ADD COLUMN "overall_length_mm" real`);
    await q.query(`ALTER TABLE "flex_part" ADD COLUMN "mean_diameter_mm" real`);
    await q.query(`ALTER TABLE "flex_part" ADD COLUMN "rated_angular_deg" real NOT NULL DEFAULT (0)`);
    await q.query(`ALTER TABLE "flex_part" ADD COLUMN "rated_cycles" integer`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const column of ['rated_cycles', 'rated_angular_deg', 'mean_diameter_mm', 'overall_length_mm', 'purpose']) {
      await q.query(`ALTER TABLE "flex_part" DROP COLUMN "${column}"`);
    }
  }
}
