import { TableColumn, type MigrationInterface, type QueryRunner } from 'typeorm';

/**
 * Lists whose rows can share a timestamp break the tie by insertion order. SQLite has it as the
 * implicit `rowid`; PostgreSQL gets a column of that name, so the same queries order alike on both.
 */
export const INSERTION_ORDERED_TABLES = ['activity', 'alloy_revision', 'quote_event', 'mail_message'];

export class InsertionOrder1764601500000 implements MigrationInterface {
  name = 'InsertionOrder1764601500000';

  async up(q: QueryRunner): Promise<void> {
    if (q.connection.options.type !== 'postgres') return;
    for (const table of INSERTION_ORDERED_TABLES) {
      await q.addColumn(table, new TableColumn({ name: 'rowid', type: 'bigint', isGenerated: true, generationStrategy: 'increment' }));
    }
  }

  async down(q: QueryRunner): Promise<void> {
    if (q.connection.options.type !== 'postgres') return;
    for (const table of INSERTION_ORDERED_TABLES) await q.dropColumn(table, 'rowid');
  }
}
