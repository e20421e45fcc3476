import { TableCheck, TableColumn, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

/** What a flex part is for, its angular and cycle ratings, and the sizes the equivalent-movement check needs. */
export class FlexPartRatings1764600400000 implements MigrationInterface {
  name = 'FlexPartRatings1764600400000';

  async up(q: QueryRunner): Promise<void> {
    // Parts already listed were all sold as thermal bellows; with no angular rating given they take no rotation.
    await q.addColumns('flex_part', [
      new TableColumn({ name: 'purpose', type: 'varchar', default: "'thermal_bellows'" }),
      new TableColumn({ name: 'overall_length_mm', type: columnType.real, isNullable: true }),
      new TableColumn({ name: 'mean_diameter_mm', type: columnType.real, isNullable: true }),
      new TableColumn({ name: 'rated_angular_deg', type: columnType.real, default: '0' }),
      new TableColumn({ name: 'rated_cycles', type: 'integer', isNullable: true }),
    ]);
    await q.createCheckConstraint(
      'flex_part',
      new TableCheck({ name: 'chk_flex_part_purpose', expression: `"purpose" IN ('thermal_bellows','vibration_decoupler','braided_hose')` }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropCheckConstraint('flex_part', 'chk_flex_part_purpose');
    await q.dropColumns('flex_part', ['rated_cycles', 'rated_angular_deg', 'mean_diameter_mm', 'overall_length_mm', 'purpose']);
  }
}
