import { TableColumn, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

export class AlloyReview1764601310000 implements MigrationInterface {
  name = 'AlloyReview1764601310000';

  async up(q: QueryRunner): Promise<void> {
    await q.addColumns('alloy', [
      new TableColumn({ name: 'review_step', type: 'varchar', isNullable: true }),
      new TableColumn({ name: 'review_note', type: 'text', default: "''" }),
      new TableColumn({ name: 'review_by', type: 'varchar', isNullable: true }),
      new TableColumn({ name: 'review_at', type: columnType.time, isNullable: true }),
    ]);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const name of ['review_at', 'review_by', 'review_note', 'review_step']) await q.dropColumn('alloy', name);
  }
}
