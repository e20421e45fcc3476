import { Table, TableIndex, type MigrationInterface, type QueryRunner, type TableForeignKeyOptions } from 'typeorm';
import { columnType } from '../column-types';
import { EMPTY_TEXT, flagDefault, NOW } from './schema-defaults';

const refersTo = (column: string, table: string, onDelete?: string): TableForeignKeyOptions => ({
  columnNames: [column],
  referencedTableName: table,
  referencedColumnNames: ['id'],
  onDelete,
});

export class Catalogue1764600100000 implements MigrationInterface {
  name = 'Catalogue1764600100000';

  async up(q: QueryRunner): Promise<void> {
    await q.createTable(
      new Table({
        name: 'source',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'key', type: 'varchar', isNullable: true, isUnique: true },
          { name: 'kind', type: 'varchar' },
          { name: 'title', type: 'varchar' },
          { name: 'issuer', type: 'varchar', default: EMPTY_TEXT },
          { name: 'edition', type: 'varchar', default: EMPTY_TEXT },
          { name: 'url', type: 'varchar', isNullable: true },
          { name: 'note', type: 'varchar', default: EMPTY_TEXT },
          { name: 'datasheet_id', type: 'varchar', isNullable: true },
          { name: 'created_at', type: columnType.time, default: NOW },
        ],
        checks: [{ name: 'chk_source_kind', expression: `"kind" IN ('standard','handbook','datasheet','memory')` }],
      }),
    );
    await q.createTable(
      new Table({
        name: 'alloy',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'uns', type: 'varchar', isUnique: true },
          { name: 'status', type: 'varchar' },
          { name: 'published_version_id', type: 'varchar', isNullable: true },
          { name: 'draft_version_id', type: 'varchar', isNullable: true },
          { name: 'created_at', type: columnType.time, default: NOW },
          { name: 'updated_at', type: columnType.time, default: NOW },
        ],
        checks: [{ name: 'chk_alloy_status', expression: `"status" IN ('draft','published','retired')` }],
      }),
    );
    await q.createTable(
      new Table({
        name: 'alloy_version',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'alloy_id', type: 'varchar' },
          { name: 'version', type: 'integer' },
          { name: 'state', type: 'varchar' },
          { name: 'designation', type: 'varchar' },
          { name: 'uns', type: 'varchar' },
          { name: 'family', type: 'varchar' },
          { name: 'density_kg_m3', type: columnType.real },
          { name: 'density_source_id', type: 'varchar' },
          { name: 'max_continuous_c', type: columnType.real },
          { name: 'max_intermittent_c', type: columnType.real },
          { name: 'limits_source_id', type: 'varchar' },
          { name: 'price_per_kg', type: columnType.real },
          { name: 'currency', type: 'varchar' },
          { name: 'price_set_on', type: 'varchar' },
          { name: 'price_is_demo', type: columnType.flag, default: flagDefault(false) },
          { name: 'reference_temp_c', type: columnType.real },
          { name: 'notes', type: 'text', default: EMPTY_TEXT },
          { name: 'warning_ranges', type: columnType.json },
          { name: 'created_by', type: 'varchar', isNullable: true },
          { name: 'created_at', type: columnType.time, default: NOW },
          { name: 'published_by', type: 'varchar', isNullable: true },
          { name: 'published_at', type: columnType.time, isNullable: true },
        ],
        checks: [{ name: 'chk_alloy_version_state', expression: `"state" IN ('draft','published','superseded')` }],
        foreignKeys: [refersTo('alloy_id', 'alloy', 'CASCADE'), refersTo('density_source_id', 'source'), refersTo('limits_source_id', 'source')],
        indices: [new TableIndex({ name: 'idx_alloy_version_number', columnNames: ['alloy_id', 'version'], isUnique: true })],
      }),
    );
    await q.createTable(
      new Table({
        name: 'property_point',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'version_id', type: 'varchar' },
          { name: 'kind', type: 'varchar' },
          { name: 'temp_c', type: columnType.real },
          { name: 'value', type: columnType.real },
          { name: 'source_id', type: 'varchar' },
        ],
        checks: [{ name: 'chk_property_point_kind', expression: `"kind" IN ('cte','modulus','yield')` }],
        foreignKeys: [refersTo('version_id', 'alloy_version', 'CASCADE'), refersTo('source_id', 'source')],
        indices: [new TableIndex({ name: 'idx_property_point', columnNames: ['version_id', 'kind', 'temp_c'], isUnique: true })],
      }),
    );
    await q.createTable(
      new Table({
        name: 'alloy_revision',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'alloy_id', type: 'varchar' },
          { name: 'version', type: 'integer', isNullable: true },
          { name: 'action', type: 'varchar' },
          { name: 'user_id', type: 'varchar', isNullable: true },
          { name: 'user_name', type: 'varchar', isNullable: true },
          { name: 'note', type: 'varchar', default: EMPTY_TEXT },
          { name: 'diff', type: columnType.json },
          { name: 'at', type: columnType.time, default: NOW },
        ],
        foreignKeys: [refersTo('alloy_id', 'alloy', 'CASCADE')],
        indices: [new TableIndex({ name: 'idx_alloy_revision_alloy', columnNames: ['alloy_id'] })],
      }),
    );
    await q.createTable(
      new Table({
        name: 'datasheet',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'alloy_id', type: 'varchar' },
          { name: 'original_name', type: 'varchar' },
          { name: 'stored_name', type: 'varchar', isUnique: true },
          { name: 'size_bytes', type: 'integer' },
          { name: 'sha256', type: 'varchar' },
          { name: 'uploaded_by', type: 'varchar', isNullable: true },
          { name: 'uploaded_at', type: columnType.time, default: NOW },
        ],
        foreignKeys: [refersTo('alloy_id', 'alloy', 'CASCADE')],
      }),
    );
    await q.createTable(
      new Table({
        name: 'flex_part',
        columns: [
          { name: 'id', type: 'varchar', isPrimary: true },
          { name: 'code', type: 'varchar', isUnique: true },
          { name: 'name', type: 'varchar' },
          ...['bore_mm', 'live_length_mm', 'rated_axial_compression_mm', 'rated_axial_extension_mm', 'lateral_offset_mm', 'max_temp_c', 'price'].map(
            (name) => ({ name, type: columnType.real }),
          ),
          { name: 'currency', type: 'varchar' },
          { name: 'active', type: columnType.flag, default: flagDefault(true) },
          { name: 'is_demo', type: columnType.flag, default: flagDefault(false) },
          { name: 'created_at', type: columnType.time, default: NOW },
          { name: 'updated_at', type: columnType.time, default: NOW },
        ],
      }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['flex_part', 'datasheet', 'alloy_revision', 'property_point', 'alloy_version', 'alloy', 'source']) {
      await q.dropTable(table);
    }
  }
}
