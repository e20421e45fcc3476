import { Table, TableForeignKey, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

export class QuoteLimitOverrides1764601300000 implements MigrationInterface {
  name = 'QuoteLimitOverrides1764601300000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'quote_limit_override',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'quote_id', type: 'varchar' },
          { name: 'option_index', type: 'integer' },
          { name: 'option_key', type: 'text' },
          { name: 'reason', type: 'text' },
          { name: 'by_user_id', type: 'varchar', isNullable: true },
          { name: 'by_name', type: 'varchar' },
          { name: 'at', type: columnType.time },
        ],
        foreignKeys: [new TableForeignKey({ columnNames: ['quote_id'], referencedTableName: 'quote', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
    await q.createIndex('quote_limit_override', new TableIndex({ name: 'IDX_quote_limit_override_quote', columnNames: ['quote_id', 'option_index'], isUnique: true }));
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('quote_limit_override');
  }
}
