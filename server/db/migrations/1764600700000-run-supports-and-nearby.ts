import { type MigrationInterface, type QueryRunner, TableColumn } from 'typeorm';
import { columnType } from '../column-types';

/** Supports part-way along a run and the items near it whose hot gap is checked. */
export class RunSupportsAndNearby1764600700000 implements MigrationInterface {
  name = 'RunSupportsAndNearby1764600700000';

  async up(q: QueryRunner): Promise<void> {
    await q.addColumns('job_run', [
      new TableColumn({ name: 'supports', type: columnType.json, isNullable: false, default: "'[]'" }),
      new TableColumn({ name: 'nearby', type: columnType.json, isNullable: false, default: "'[]'" }),
    ]);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropColumns('job_run', ['supports', 'nearby']);
  }
}
