// Raw connections to the two kinds of Dilato database for `npm run migrate-data`. Raw drivers, not
// TypeORM: entity column types are fixed per process by DATABASE_URL, and one run reads one kind and
// writes the other.
import Database from 'better-sqlite3';
import { Client } from 'pg';
import { INSERTION_ORDERED_TABLES } from '../../server/db/migrations/1764601500000-insertion-order';

/** How a column's values are normalised, so both databases' representations of one value agree. */
export type ColumnKind = 'time' | 'flag' | 'number' | 'text';
export interface ColumnInfo {
  name: string;
  kind: ColumnKind;
}
export type Row = Record<string, unknown>;

export const MIGRATIONS_TABLE = 'migrations';

export interface MigrationDatabase {
  kind: 'sqlite' | 'postgres';
  /** Every table but the migrations table (each database keeps its own). */
  tables(): Promise<string[]>;
  columns(table: string): Promise<ColumnInfo[]>;
  primaryKey(table: string): Promise<string[]>;
  /** The other tables this one's foreign keys point at. */
  references(table: string): Promise<string[]>;
  count(table: string): Promise<number>;
  /** Rows in primary-key order (byte order for text on both), a batch at a time. */
  rows(table: string, columns: ColumnInfo[], orderBy: string[], batchSize: number): AsyncIterable<Row[]>;
  insert(table: string, columns: ColumnInfo[], rows: Row[]): Promise<void>;
  /** Moves generated-number columns (PostgreSQL's `rowid` sequences) past the copied values. */
  resetSequences(table: string): Promise<void>;
  migrationNames(): Promise<string[]>;
  /** A transaction; on a source, one consistent snapshot for all tables. */
  begin(): Promise<void>;
  commit(): Promise<void>;
  rollback(): Promise<void>;
  close(): Promise<void>;
}

const quote = (name: string) => `"${name.replace(/"/g, '""')}"`;

function kindOf(declared: string): ColumnKind {
  const t = declared.toLowerCase();
  if (t.includes('time') || t === 'date') return 'time';
  if (t === 'boolean') return 'flag';
  if (/int|real|double|numeric|float|decimal/.test(t)) return 'number';
  return 'text';
}

/** SQLite keeps a datetime as UTC text ('YYYY-MM-DD HH:MM:SS.SSS'), the form TypeORM writes. */
function sqliteTime(value: Date): string {
  return value.toISOString().replace('T', ' ').replace('Z', '');
}

function toSqlite(value: unknown, kind: ColumnKind | 'unix-seconds'): unknown {
  if (value === null || value === undefined) return null;
  if (kind === 'unix-seconds') return Math.floor(asTime(value).getTime() / 1000);
  if (kind === 'flag') return value ? 1 : 0;
  if (kind === 'time') return sqliteTime(asTime(value));
  if (kind === 'number') return Number(value);
  return value;
}

export function openSqlite(file: string, options: { readonly: boolean }): MigrationDatabase {
  const db = new Database(file, { readonly: options.readonly, fileMustExist: options.readonly });
  db.pragma('foreign_keys = ON');
  const tableInfo = (table: string) => db.prepare(`PRAGMA table_info(${quote(table)})`).all() as { name: string; type: string; pk: number }[];
  return {
    kind: 'sqlite',
    tables: async () =>
      (db.prepare("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite\\_%' ESCAPE '\\' AND name <> ? ORDER BY name").all(MIGRATIONS_TABLE) as { name: string }[]).map((r) => r.name),
    columns: async (table) => {
      const columns = tableInfo(table).map((c) => ({ name: c.name, kind: kindOf(c.type) }));
      // SQLite's implicit rowid is the insertion order PostgreSQL keeps in a real `rowid` column.
      return INSERTION_ORDERED_TABLES.includes(table) ? [...columns, { name: 'rowid', kind: 'number' as const }] : columns;
    },
    primaryKey: async (table) =>
      tableInfo(table)
        .filter((c) => c.pk > 0)
        .sort((a, b) => a.pk - b.pk)
        .map((c) => c.name),
    references: async (table) => [...new Set((db.prepare(`PRAGMA foreign_key_list(${quote(table)})`).all() as { table: string }[]).map((r) => r.table))],
    count: async (table) => (db.prepare(`SELECT COUNT(*) AS n FROM ${quote(table)}`).get() as { n: number }).n,
    async *rows(table, columns, orderBy, batchSize) {
      const sql = `SELECT ${columns.map((c) => quote(c.name)).join(', ')} FROM ${quote(table)} ORDER BY ${orderBy.map(quote).join(', ')}`;
      let batch: Row[] = [];
      for (const row of db.prepare(sql).iterate() as Iterable<Row>) {
        batch.push(row);
        if (batch.length >= batchSize) {
          yield batch;
          batch = [];
        }
      }
      if (batch.length) yield batch;
    },
    insert: async (table, columns, rows) => {
      // lucia's SQLite adapter keeps session expiry as Unix seconds where PostgreSQL has a timestamptz.
      const ownKinds = new Map(tableInfo(table).map((c) => [c.name, kindOf(c.type)]));
      const kinds = columns.map((c) => (c.kind === 'time' && ownKinds.get(c.name) === 'number' ? 'unix-seconds' : c.kind));
      const stmt = db.prepare(`INSERT INTO ${quote(table)} (${columns.map((c) => quote(c.name)).join(', ')}) VALUES (${columns.map(() => '?').join(', ')})`);
      for (const row of rows) stmt.run(columns.map((c, i) => toSqlite(row[c.name], kinds[i])));
    },
    resetSequences: async () => undefined,
    migrationNames: async () => {
      const found = db.prepare("SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?").get(MIGRATIONS_TABLE);
      return found ? (db.prepare(`SELECT name FROM ${quote(MIGRATIONS_TABLE)} ORDER BY name`).all() as { name: string }[]).map((r) => r.name) : [];
    },
    begin: async () => void db.exec('BEGIN'),
    commit: async () => void db.exec('COMMIT'),
    rollback: async () => void db.exec('ROLLBACK'),
    close: async () => void db.close(),
  };
}

// PostgreSQL allows 65535 parameters in one statement.
const MAX_PARAMETERS = 60_000;

export async function openPostgres(url: string): Promise<MigrationDatabase> {
  const client = new Client({ connectionString: url });
  await client.connect();
  const q = async <T = Row>(sql: string, params: unknown[] = []) => (await client.query(sql, params)).rows as T[];
  const textColumns = new Map<string, Set<string>>();
  return {
    kind: 'postgres',
    tables: async () =>
      (await q<{ name: string }>("SELECT table_name AS name FROM information_schema.tables WHERE table_schema = current_schema() AND table_type = 'BASE TABLE' AND table_name <> $1 ORDER BY table_name", [MIGRATIONS_TABLE])).map((r) => r.name),
    columns: async (table) => {
      const rows = await q<{ name: string; type: string }>('SELECT column_name AS name, data_type AS type FROM information_schema.columns WHERE table_schema = current_schema() AND table_name = $1 ORDER BY ordinal_position', [table]);
      textColumns.set(table, new Set(rows.filter((r) => kindOf(r.type) === 'text').map((r) => r.name)));
      return rows.map((r) => ({ name: r.name, kind: kindOf(r.type) }));
    },
    primaryKey: async (table) =>
      (
        await q<{ name: string }>(
          `SELECT a.attname AS name FROM pg_index i JOIN pg_attribute a ON a.attrelid = i.indrelid AND a.attnum = ANY(i.indkey)
           WHERE i.indrelid = $1::regclass AND i.indisprimary ORDER BY array_position(i.indkey, a.attnum)`,
          [quote(table)],
        )
      ).map((r) => r.name),
    references: async (table) =>
      (await q<{ name: string }>("SELECT DISTINCT confrelid::regclass::text AS name FROM pg_constraint WHERE conrelid = $1::regclass AND contype = 'f'", [quote(table)])).map((r) => r.name.replace(/^"|"$/g, '')),
    count: async (table) => Number((await q<{ n: string }>(`SELECT COUNT(*) AS n FROM ${quote(table)}`))[0].n),
    async *rows(table, columns, orderBy, batchSize) {
      // C collation: text in byte order, as SQLite's BINARY compares it, whatever the database's locale.
      const text = textColumns.get(table) ?? new Set();
      const order = orderBy.map((c) => (text.has(c) ? `${quote(c)} COLLATE "C"` : quote(c))).join(', ');
      const sql = `SELECT ${columns.map((c) => quote(c.name)).join(', ')} FROM ${quote(table)} ORDER BY ${order} LIMIT $1 OFFSET $2`;
      for (let offset = 0; ; offset += batchSize) {
        const batch = await q(sql, [batchSize, offset]);
        if (batch.length) yield batch;
        if (batch.length < batchSize) return;
      }
    },
    insert: async (table, columns, rows) => {
      const perStatement = Math.max(1, Math.floor(MAX_PARAMETERS / columns.length));
      for (let start = 0; start < rows.length; start += perStatement) {
        const chunk = rows.slice(start, start + perStatement);
        const params: unknown[] = [];
        const values = chunk.map((row) => `(${columns.map((c) => `$${params.push(toPostgres(row[c.name], c.kind))}`).join(', ')})`);
        await client.query(`INSERT INTO ${quote(table)} (${columns.map((c) => quote(c.name)).join(', ')}) VALUES ${values.join(', ')}`, params);
      }
    },
    resetSequences: async (table) => {
      const serial = await q<{ column: string; sequence: string }>(
        `SELECT column_name AS column, pg_get_serial_sequence($1, column_name) AS sequence FROM information_schema.columns
         WHERE table_schema = current_schema() AND table_name = $2 AND pg_get_serial_sequence($1, column_name) IS NOT NULL`,
        [quote(table), table],
      );
      for (const { column, sequence } of serial) {
        await client.query(`SELECT setval($1, COALESCE((SELECT MAX(${quote(column)}) FROM ${quote(table)}), 0) + 1, false)`, [sequence]);
      }
    },
    migrationNames: async () => {
      const found = await q("SELECT 1 FROM information_schema.tables WHERE table_schema = current_schema() AND table_name = $1", [MIGRATIONS_TABLE]);
      return found.length ? (await q<{ name: string }>(`SELECT name FROM ${quote(MIGRATIONS_TABLE)} ORDER BY name COLLATE "C"`)).map((r) => r.name) : [];
    },
    // Repeatable read: as a source, every table is read from one snapshot.
    begin: async () => void (await client.query('BEGIN ISOLATION LEVEL REPEATABLE READ')),
    commit: async () => void (await client.query('COMMIT')),
    rollback: async () => void (await client.query('ROLLBACK')),
    close: () => client.end(),
  };
}

function toPostgres(value: unknown, kind: ColumnKind): unknown {
  if (value === null || value === undefined) return null;
  if (kind === 'flag') return Boolean(value);
  if (kind === 'time') return asTime(value);
  return value;
}

/** A point in time from either database: a Date (pg), SQLite datetime text, or Unix seconds (lucia's SQLite session expiry). */
export function asTime(value: unknown): Date {
  if (value instanceof Date) return value;
  if (typeof value === 'number') return new Date(value * 1000);
  return parseSqliteTime(String(value));
}

/** A SQLite datetime without a zone is UTC (TypeORM and `datetime('now')` both write UTC). */
export function parseSqliteTime(text: string): Date {
  const plain = /^\d{4}-\d\d-\d\d([ T]\d\d:\d\d(:\d\d(\.\d+)?)?)?$/.test(text);
  const date = new Date(plain ? `${text.replace(' ', 'T')}${text.length > 10 ? 'Z' : 'T00:00:00Z'}` : text);
  if (Number.isNaN(date.getTime())) throw new Error(`not a point in time: ${JSON.stringify(text)}`);
  return date;
}

/** `sqlite:path` (or a bare path) or `postgres://…`. */
export function openMigrationDatabase(url: string, options: { readonly: boolean }): Promise<MigrationDatabase> {
  if (/^postgres(ql)?:\/\//.test(url)) return openPostgres(url);
  return Promise.resolve(openSqlite(sqlitePath(url), options));
}

export const sqlitePath = (url: string) => url.replace(/^sqlite:(\/\/)?/, '');
