import { TableColumn, type MigrationInterface, type QueryRunner } from 'typeorm';
import { EMPTY_TEXT } from './schema-defaults';

/** What a user must know about an alloy's data (limits lowered to the data, values still to be verified). */
export class AlloyDataCautions1764600500000 implements MigrationInterface {
  name = 'AlloyDataCautions1764600500000';

  async up(q: QueryRunner): Promise<void> {
    await q.addColumn('alloy_version', new TableColumn({ name: 'data_cautions', type: 'text', default: EMPTY_TEXT }));
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropColumn('alloy_version', 'data_cautions');
  }
}
