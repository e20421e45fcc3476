import { type MigrationInterface, type QueryRunner, TableColumn } from 'typeorm';

/** What each end flange of a run is made of; null = the run's own alloy. */
export class RunFlangeAlloys1764601210000 implements MigrationInterface {
  name = 'RunFlangeAlloys1764601210000';

  async up(q: QueryRunner): Promise<void> {
    await q.addColumns('job_run', [
      new TableColumn({ name: 'start_flange_alloy_id', type: 'varchar', isNullable: true }),
      new TableColumn({ name: 'end_flange_alloy_id', type: 'varchar', isNullable: true }),
    ]);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropColumns('job_run', ['start_flange_alloy_id', 'end_flange_alloy_id']);
  }
}
