import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';
import { EMPTY_TEXT } from './schema-defaults';

export class Jobs1764600200000 implements MigrationInterface {
  name = 'Jobs1764600200000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'job',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'name', type: 'varchar' },
          { name: 'customer', type: 'varchar' },
          { name: 'application', type: 'varchar' },
          { name: 'status', type: 'varchar' },
          { name: 'notes', type: 'text', default: EMPTY_TEXT },
          { name: 'created_by', type: 'varchar', isNullable: true },
          { name: 'created_at', type: columnType.time },
          { name: 'updated_at', type: columnType.time },
        ],
        checks: [{ name: 'chk_job_status', expression: `"status" IN ('active','archived')` }],
        foreignKeys: [{ columnNames: ['created_by'], referencedTableName: 'app_user', referencedColumnNames: ['id'], onDelete: 'SET NULL' }],
        indices: [new TableIndex({ name: 'idx_job_status_updated', columnNames: ['status', 'updated_at'] })],
      }),
    );
    // Segments and the joint are small ordered documents read and written whole with their run.
    await q.createTable(
      new Table({
        name: 'job_run',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'job_id', type: 'varchar' },
          { name: 'position', type: 'integer' },
          { name: 'name', type: 'varchar' },
          { name: 'alloy_id', type: 'varchar' },
          { name: 'od_mm', type: columnType.real },
          { name: 'wall_mm', type: columnType.real },
          { name: 'install_temp_c', type: columnType.real },
          { name: 'segments', type: columnType.json },
          { name: 'start_fixing', type: 'varchar' },
          { name: 'end_fixing', type: 'varchar' },
          { name: 'joint', type: columnType.json },
          { name: 'notes', type: 'text', default: EMPTY_TEXT },
          { name: 'created_at', type: columnType.time },
          { name: 'updated_at', type: columnType.time },
        ],
        checks: [
          { name: 'chk_job_run_position', expression: `"position" >= 1` },
          { name: 'chk_job_run_od', expression: `"od_mm" > 0` },
          { name: 'chk_job_run_wall', expression: `"wall_mm" > 0` },
        ],
        foreignKeys: [
          { columnNames: ['job_id'], referencedTableName: 'job', referencedColumnNames: ['id'], onDelete: 'CASCADE' },
          { columnNames: ['alloy_id'], referencedTableName: 'alloy', referencedColumnNames: ['id'] },
        ],
        indices: [new TableIndex({ name: 'idx_job_run_job_position', columnNames: ['job_id', 'position'] })],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('job_run');
    await q.dropTable('job');
  }
}
