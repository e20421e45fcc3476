import { TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';

/** The job list with every status is ordered by the last change alone; (status, updated_at) serves the filtered lists. */
export class ListIndexes1764601600000 implements MigrationInterface {
  name = 'ListIndexes1764601600000';

  async up(q: QueryRunner): Promise<void> {
    await q.createIndex('job', new TableIndex({ name: 'idx_job_updated', columnNames: ['updated_at'] }));
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropIndex('job', 'idx_job_updated');
  }
}
