import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';

/** One counter per cached kind of data; a writer bumps it in its transaction, every instance compares before trusting memory. */
export class CacheStamps1764601620000 implements MigrationInterface {
  name = 'CacheStamps1764601620000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'cache_stamp',
        columns: [
          { name: 'name', type: 'varchar', isPrimary: true },
          { name: 'stamp', type: 'integer' },
        ],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('cache_stamp');
  }
}
