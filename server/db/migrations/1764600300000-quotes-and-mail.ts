import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';
import { EMPTY_TEXT, NOW } from './schema-defaults';

export class QuotesAndMail1764600300000 implements MigrationInterface {
  name = 'QuotesAndMail1764600300000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'mail_message',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'message_id', type: 'varchar', isNullable: true },
          { name: 'from_address', type: 'varchar' },
          { name: 'to_addresses', type: 'varchar' },
          { name: 'subject', type: 'varchar' },
          { name: 'text', type: 'text' },
          { name: 'html', type: 'text' },
          { name: 'size_bytes', type: 'integer' },
          { name: 'received_at', type: columnType.time },
        ],
      }),
    );
    await q.createTable(
      new Table({
        name: 'shop_settings',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'value', type: columnType.json },
          { name: 'updated_by', type: 'varchar', isNullable: true },
          { name: 'updated_at', type: columnType.time, default: NOW },
        ],
      }),
    );
    await q.createTable(
      new Table({
        name: 'quote',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'number', type: 'varchar', isUnique: true },
          { name: 'job_id', type: 'varchar' },
          { name: 'customer_name', type: 'varchar' },
          { name: 'customer_email', type: 'varchar' },
          { name: 'customer_company', type: 'varchar', default: EMPTY_TEXT },
          { name: 'valid_until', type: 'varchar' },
          { name: 'message', type: 'text', default: EMPTY_TEXT },
          { name: 'status', type: 'varchar' },
          { name: 'options', type: columnType.json },
          { name: 'snapshot', type: columnType.json, isNullable: true },
          { name: 'token_hash', type: 'varchar', isNullable: true, isUnique: true },
          { name: 'accepted_option_index', type: 'integer', isNullable: true },
          { name: 'decided_by', type: 'varchar', isNullable: true },
          { name: 'created_by', type: 'varchar', isNullable: true },
          { name: 'created_at', type: columnType.time },
          { name: 'updated_at', type: columnType.time },
          { name: 'sent_at', type: columnType.time, isNullable: true },
        ],
        checks: [{ name: 'chk_quote_status', expression: `"status" IN ('draft','sent','viewed','accepted','declined','expired')` }],
        foreignKeys: [{ columnNames: ['job_id'], referencedTableName: 'job', referencedColumnNames: ['id'] }],
      }),
    );
    await q.createTable(
      new Table({
        name: 'quote_event',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'quote_id', type: 'varchar' },
          { name: 'status', type: 'varchar' },
          { name: 'note', type: 'varchar', default: EMPTY_TEXT },
          { name: 'by', type: 'varchar', isNullable: true },
          { name: 'at', type: columnType.time },
        ],
        foreignKeys: [{ columnNames: ['quote_id'], referencedTableName: 'quote', referencedColumnNames: ['id'], onDelete: 'CASCADE' }],
        indices: [new TableIndex({ name: 'idx_quote_event_quote', columnNames: ['quote_id'] })],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['quote_event', 'quote', 'shop_settings', 'mail_message']) await q.dropTable(table);
  }
}
