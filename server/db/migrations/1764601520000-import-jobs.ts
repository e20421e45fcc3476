import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

/** CSV imports' progress, shared by every app instance (it was in one process's memory). */
export class ImportJobs1764601520000 implements MigrationInterface {
  name = 'ImportJobs1764601520000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'import_job',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'phase', type: 'varchar' },
          { name: 'done', type: 'integer' },
          { name: 'total', type: 'integer' },
          { name: 'running_slot', type: 'varchar', isNullable: true },
          { name: 'started_by', type: 'varchar', isNullable: true },
          { name: 'report', type: columnType.json, isNullable: true },
          { name: 'error', type: 'varchar', isNullable: true },
          { name: 'started_at', type: columnType.time },
          { name: 'updated_at', type: columnType.time },
          { name: 'finished_at', type: columnType.time, isNullable: true },
        ],
        indices: [new TableIndex({ name: 'idx_import_job_running', columnNames: ['running_slot'], isUnique: true })],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('import_job');
  }
}
