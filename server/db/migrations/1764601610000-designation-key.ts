import { TableColumn, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';

/** A sortable designation and a search text per version, so the alloy list sorts and searches in the query (rows from before are filled in by the seed step on start). */
export class DesignationKey1764601610000 implements MigrationInterface {
  name = 'DesignationKey1764601610000';

  async up(q: QueryRunner): Promise<void> {
    await q.addColumn('alloy_version', new TableColumn({ name: 'designation_key', type: 'varchar', default: "''" }));
    await q.addColumn('alloy_version', new TableColumn({ name: 'search_text', type: 'varchar', default: "''" }));
    // Holds what the list filters and sorts by, so a search scans the index rather than the wide version rows.
    await q.createIndex(
      'alloy_version',
      new TableIndex({ name: 'idx_alloy_version_list', columnNames: ['designation_key', 'search_text', 'family', 'max_continuous_c', 'price_per_kg', 'id'] }),
    );
    await q.createIndex('alloy', new TableIndex({ name: 'idx_alloy_published_version', columnNames: ['published_version_id'] }));
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropIndex('alloy', 'idx_alloy_published_version');
    await q.dropIndex('alloy_version', 'idx_alloy_version_list');
    await q.dropColumn('alloy_version', 'search_text');
    await q.dropColumn('alloy_version', 'designation_key');
  }
}
