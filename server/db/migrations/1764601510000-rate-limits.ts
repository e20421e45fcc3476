import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';

/**
 * Sign-in and public-route counters shared by every app instance, in the layout rate-limiter-flexible's
 * SQLite and PostgreSQL stores read (`key` is the limiter's prefix and the counted key; `expire` is ms since 1970).
 */
export class RateLimits1764601510000 implements MigrationInterface {
  name = 'RateLimits1764601510000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'rate_limit',
        columns: [
          { name: 'key', type: 'varchar', length: '255', isPrimary: true },
          { name: 'points', type: 'integer', default: '0' },
          { name: 'expire', type: 'bigint', isNullable: true },
        ],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropTable('rate_limit');
  }
}
