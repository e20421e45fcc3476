import { Table, TableForeignKey, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

export class QuoteDeposits1764600900000 implements MigrationInterface {
  name = 'QuoteDeposits1764600900000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'quote_deposit',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'quote_id', type: 'varchar', isUnique: true },
          { name: 'status', type: 'varchar' },
          { name: 'share_pct', type: 'integer' },
          { name: 'amount_minor', type: 'integer' },
          { name: 'currency', type: 'varchar' },
          { name: 'attempts', type: 'integer' },
          { name: 'checkout_session_id', type: 'varchar', isNullable: true },
          { name: 'checkout_url', type: 'varchar', isNullable: true },
          { name: 'payment_intent_id', type: 'varchar', isNullable: true },
          { name: 'failure_message', type: 'varchar', isNullable: true },
          { name: 'refund_id', type: 'varchar', isNullable: true },
          { name: 'refund_reason', type: 'varchar', isNullable: true },
          { name: 'paid_at', type: columnType.time, isNullable: true },
          { name: 'refunded_at', type: columnType.time, isNullable: true },
          { name: 'created_at', type: columnType.time },
          { name: 'updated_at', type: columnType.time },
        ],
        foreignKeys: [new TableForeignKey({ columnNames: ['quote_id'], referencedTableName: 'quote', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
    await q.createTable(
      new Table({
        name: 'payment_event',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'type', type: 'varchar' },
          { name: 'received_at', type: columnType.time },
        ],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('payment_event');
    await q.dropTable('quote_deposit');
  }
}
