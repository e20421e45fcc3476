import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnType } from '../column-types';

export class CurrencyRates1764600510000 implements MigrationInterface {
  name = 'CurrencyRates1764600510000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'currency_rate',
        columns: [
          { name: 'from_currency', type: 'varchar', isPrimary: true },
          { name: 'to_currency', type: 'varchar', isPrimary: true },
          { name: 'rate', type: columnType.real },
          { name: 'set_by', type: 'varchar', isNullable: true },
          { name: 'set_at', type: columnType.time },
        ],
        checks: [{ name: 'chk_currency_rate_positive', expression: `"rate" > 0` }],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('currency_rate');
  }
}
