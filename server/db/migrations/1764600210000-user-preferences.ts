import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

export class UserPreferences1764600210000 implements MigrationInterface {
  name = 'UserPreferences1764600210000';

  async up(q: QueryRunner): Promise<void> {
    // A row only once a user chooses; no row reads as the defaults.
    await q.createTable(
      new Table({
        name: 'user_preference',
        columns: [
          { name: 'user_id', type: 'varchar', isPrimary: true },
          { name: 'unit_system', type: 'varchar' },
          { name: 'updated_at', type: columnType.time },
        ],
        checks: [{ name: 'chk_user_preference_units', expression: `"unit_system" IN ('metric','imperial')` }],
        foreignKeys: [{ columnNames: ['user_id'], referencedTableName: 'app_user', referencedColumnNames: ['id'], onDelete: 'CASCADE' }],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('user_preference');
  }
}
