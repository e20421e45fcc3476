// Copies every table of one Dilato database into another in foreign-key order, then checks the
// target against the source by row count and by a checksum over normalised rows.
import { createHash } from 'node:crypto';
import { asTime, type ColumnInfo, type MigrationDatabase, type Row } from './migrate-databases';

const BATCH_SIZE = 1000;

export interface TableReport {
  table: string;
  rows: number;
  checksum: string;
}

/** One value as both databases agree on it: instants as ISO text, flags as booleans, numbers as numbers. */
export function normalise(value: unknown, kind: ColumnInfo['kind']): unknown {
  if (value === null || value === undefined) return null;
  switch (kind) {
    case 'time':
      return asTime(value).toISOString();
    case 'flag':
      return Boolean(value);
    case 'number':
      return Number(value);
    default:
      return String(value);
  }
}

/** Tables in an order where every table comes after the tables its foreign keys point at. */
export async function dependencyOrder(db: MigrationDatabase, tables: string[]): Promise<string[]> {
  const refs = new Map<string, string[]>();
  for (const t of tables) refs.set(t, (await db.references(t)).filter((r) => r !== t && tables.includes(r)));
  const ordered: string[] = [];
  const visiting = new Set<string>();
  const visit = (t: string) => {
    if (ordered.includes(t)) return;
    if (visiting.has(t)) throw new Error(`foreign keys form a cycle through ${t}`);
    visiting.add(t);
    for (const r of refs.get(t)!) visit(r);
    visiting.delete(t);
    ordered.push(t);
  };
  for (const t of [...tables].sort()) visit(t);
  return ordered;
}

/** The columns both sides have, in name order, so the checksum does not depend on column positions. */
export async function sharedColumns(source: MigrationDatabase, target: MigrationDatabase, table: string): Promise<ColumnInfo[]> {
  const from = await source.columns(table);
  const to = new Map((await target.columns(table)).map((c) => [c.name, c]));
  const missing = [...from.filter((c) => !to.has(c.name)).map((c) => `${c.name} (only in the source)`), ...[...to.keys()].filter((n) => !from.some((c) => c.name === n)).map((n) => `${n} (only in the target)`)];
  if (missing.length) throw new Error(`table ${table} differs between the databases: ${missing.join(', ')}`);
  return from
    .map((c) => {
      const other = to.get(c.name)!.kind;
      if (c.kind === other) return c;
      // A point in time on one side and a number on the other: Unix seconds (lucia's SQLite session expiry).
      if ([c.kind, other].includes('time') && [c.kind, other].includes('number')) return { name: c.name, kind: 'time' as const };
      throw new Error(`column ${table}.${c.name} holds ${c.kind} in the source but ${other} in the target`);
    })
    .sort((a, b) => (a.name < b.name ? -1 : 1));
}

async function orderOf(db: MigrationDatabase, table: string, columns: ColumnInfo[]): Promise<string[]> {
  const key = await db.primaryKey(table);
  return key.length ? key : columns.map((c) => c.name);
}

/** Row count and sha256 over the table's rows in key order, each row as a JSON array of normalised values. */
export async function tableChecksum(db: MigrationDatabase, table: string, columns: ColumnInfo[]): Promise<TableReport> {
  const hash = createHash('sha256');
  let rows = 0;
  for await (const batch of db.rows(table, columns, await orderOf(db, table, columns), BATCH_SIZE)) {
    for (const row of batch) hash.update(`${JSON.stringify(columns.map((c) => normalise(row[c.name], c.kind)))}\n`);
    rows += batch.length;
  }
  return { table, rows, checksum: hash.digest('hex') };
}

/** Product tables of the target that hold rows (the migrations table does not count). */
export async function nonEmptyTables(db: MigrationDatabase): Promise<string[]> {
  const found: string[] = [];
  for (const t of await db.tables()) if ((await db.count(t)) > 0) found.push(t);
  return found;
}

/**
 * Copies all tables in one transaction and compares counts and checksums before committing, so a
 * mismatch leaves the target as empty as it was.
 */
export async function copyTables(source: MigrationDatabase, target: MigrationDatabase, log: (line: string) => void = () => undefined): Promise<TableReport[]> {
  const sourceTables = await source.tables();
  const targetTables = await target.tables();
  const onlyOneSide = [...sourceTables.filter((t) => !targetTables.includes(t)), ...targetTables.filter((t) => !sourceTables.includes(t))];
  if (onlyOneSide.length) throw new Error(`the databases have different tables: ${onlyOneSide.join(', ')}`);
  const order = await dependencyOrder(target, targetTables);
  const reports: TableReport[] = [];
  await source.begin();
  await target.begin();
  try {
    for (const table of order) {
      const columns = await sharedColumns(source, target, table);
      const sourceOrder = await orderOf(source, table, columns);
      for await (const batch of source.rows(table, columns, sourceOrder, BATCH_SIZE)) await target.insert(table, columns, batch as Row[]);
      await target.resetSequences(table);
      const [from, to] = [await tableChecksum(source, table, columns), await tableChecksum(target, table, columns)];
      if (from.rows !== to.rows || from.checksum !== to.checksum) {
        throw new Error(`table ${table} did not copy faithfully: source ${from.rows} rows (${from.checksum.slice(0, 12)}), target ${to.rows} rows (${to.checksum.slice(0, 12)})`);
      }
      log(`  ${table}: ${to.rows} rows, sha256 ${to.checksum.slice(0, 16)}`);
      reports.push(to);
    }
    await target.commit();
  } catch (err) {
    await target.rollback();
    throw err;
  } finally {
    await source.rollback();
  }
  return reports;
}
