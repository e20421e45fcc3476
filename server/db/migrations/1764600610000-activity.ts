import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

export class Activity1764600610000 implements MigrationInterface {
  name = 'Activity1764600610000';

  async up(q: QueryRunner): Promise<void> {
    // No foreign keys: the entries outlive a deleted run, which is the point of keeping them.
    await q.createTable(
      new Table({
        name: 'activity',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'subject', type: 'varchar' },
          { name: 'subject_id', type: 'varchar' },
          { name: 'subject_name', type: 'varchar' },
          { name: 'job_id', type: 'varchar', isNullable: true },
          { name: 'action', type: 'varchar' },
          { name: 'changes', type: columnType.json },
          { name: 'user_id', type: 'varchar', isNullable: true },
          { name: 'user_name', type: 'varchar', isNullable: true },
          { name: 'at', type: columnType.time },
        ],
        checks: [{ name: 'chk_activity_subject', expression: `"subject" IN ('job','run','quote')` }],
        indices: [
          new TableIndex({ name: 'idx_activity_subject', columnNames: ['subject', 'subject_id'] }),
          new TableIndex({ name: 'idx_activity_job', columnNames: ['job_id'] }),
        ],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('activity');
  }
}
