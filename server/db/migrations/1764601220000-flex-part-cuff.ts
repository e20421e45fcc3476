import { type MigrationInterface, type QueryRunner, TableColumn } from 'typeorm';

/** The UNS number of a flex part's weld cuffs, where its maker states it. */
export class FlexPartCuff1764601220000 implements MigrationInterface {
  name = 'FlexPartCuff1764601220000';

  async up(q: QueryRunner): Promise<void> {
    await q.addColumn('flex_part', new TableColumn({ name: 'cuff_uns', type: 'varchar', isNullable: true }));
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropColumn('flex_part', 'cuff_uns');
  }
}
