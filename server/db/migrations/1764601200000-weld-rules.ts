import { type MigrationInterface, type QueryRunner, Table, TableIndex } from 'typeorm';
import { columnType } from '../column-types';

/** The shop's weld table (base-metal pairs → filler, purge, notes, procedure) and its revisions. */
export class WeldRules1764601200000 implements MigrationInterface {
  name = 'WeldRules1764601200000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'weld_rule',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'key', type: 'varchar', isNullable: true, isUnique: true },
          { name: 'side_a', type: columnType.json },
          { name: 'side_b', type: columnType.json },
          { name: 'filler', type: 'varchar' },
          { name: 'filler_spec', type: 'varchar' },
          { name: 'purge', type: 'text' },
          { name: 'notes', type: 'text', default: "''" },
          { name: 'procedure_ref', type: 'varchar', default: "''" },
          { name: 'source', type: 'text' },
          { name: 'version', type: 'integer' },
          { name: 'updated_by', type: 'varchar', isNullable: true },
          { name: 'created_at', type: columnType.time },
          { name: 'updated_at', type: columnType.time },
        ],
      }),
    );
    await q.createTable(
      new Table({
        name: 'weld_rule_revision',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'rule_id', type: 'varchar' },
          { name: 'version', type: 'integer' },
          { name: 'action', type: 'varchar' },
          { name: 'user_id', type: 'varchar', isNullable: true },
          { name: 'user_name', type: 'varchar', isNullable: true },
          { name: 'note', type: 'varchar', default: "''" },
          { name: 'diff', type: columnType.json },
          { name: 'at', type: columnType.time },
        ],
      }),
    );
    await q.createIndex('weld_rule_revision', new TableIndex({ name: 'IDX_weld_rule_revision_rule', columnNames: ['rule_id', 'version'] }));
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('weld_rule_revision');
    await q.dropTable('weld_rule');
  }
}
