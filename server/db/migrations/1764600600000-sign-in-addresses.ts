import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

export class SignInAddresses1764600600000 implements MigrationInterface {
  name = 'SignInAddresses1764600600000';

  async up(q: QueryRunner): Promise<void> {
    // Where each user has signed in before (a hash of the address, not the address): failures there slow down rather than lock.
    await q.createTable(
      new Table({
        name: 'sign_in_address',
        columns: [
          { name: 'user_id', type: 'varchar', isPrimary: true },
          { name: 'address_hash', type: 'varchar', isPrimary: true },
          { name: 'last_success_at', type: columnType.time },
        ],
        foreignKeys: [{ columnNames: ['user_id'], referencedTableName: 'app_user', referencedColumnNames: ['id'], onDelete: 'CASCADE' }],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('sign_in_address');
  }
}
