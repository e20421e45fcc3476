import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';
import { flagDefault, NOW } from './schema-defaults';

export class UsersAndSessions1764600000000 implements MigrationInterface {
  name = 'UsersAndSessions1764600000000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'app_user',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'email', type: 'varchar', isUnique: true },
          { name: 'name', type: 'varchar' },
          { name: 'role', type: 'varchar' },
          { name: 'password_hash', type: 'varchar' },
          { name: 'active', type: columnType.flag, default: flagDefault(true) },
          { name: 'created_at', type: columnType.time, default: NOW },
          { name: 'updated_at', type: columnType.time, default: NOW },
        ],
        checks: [{ name: 'chk_app_user_role', expression: `"role" IN ('admin','engineer','fabricator','sales')` }],
      }),
    );
    // Column names follow lucia's adapters, which read this table directly: the SQLite adapter keeps
    // expiry as Unix seconds, the PostgreSQL adapter as a timestamptz.
    await q.createTable(
      new Table({
        name: 'user_session',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'user_id', type: 'varchar' },
          { name: 'expires_at', type: q.connection.options.type === 'postgres' ? 'timestamptz' : 'integer' },
        ],
        foreignKeys: [{ columnNames: ['user_id'], referencedTableName: 'app_user', referencedColumnNames: ['id'], onDelete: 'CASCADE' }],
      }),
    );
    await q.createIndex('user_session', new TableIndex({ name: 'idx_user_session_user', columnNames: ['user_id'] }));
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('user_session');
    await q.dropTable('app_user');
  }
}
