import { TableColumn, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';

/** A sortable form of each version's designation, so the alloy list sorts by name in the query (rows from before are filled in by the seed step on start). */
export class DesignationKey1764601610000 implements MigrationInterface {
  name = 'DesignationKey1764601610000';

  async up(q: QueryRunner): Promise<void> {
    await q.addColumn('alloy_version', new TableColumn({ name: 'designation_key', type: 'varchar', default: "''" }));
    await q.createIndex('alloy_version', new TableIndex({ name: 'idx_alloy_version_designation_key', columnNames: ['designation_key'] }));
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropIndex('alloy_version', 'idx_alloy_version_designation_key');
    await q.dropColumn('alloy_version', 'designation_key');
  }
}
