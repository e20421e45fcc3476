/**
 * npm run migrate-data -- --from sqlite:./data/dilato.sqlite --to postgres://… [--from-uploads DIR] [--to-uploads DIR]
 * Without --to-uploads, data sheets go to the bucket STORAGE_URL names (with the usual endpoint, region and key variables).
 *
 * Moves a shop from one Dilato database to another: makes the target's schema with the product's
 * migrations, copies every row of every table in foreign-key order in one transaction, checks row
 * counts and checksums per table before committing, then copies the data-sheet files and checks them
 * by sha256. Refuses (exit 2, nothing written) when the target already holds rows.
 */
import path from 'node:path';
import { openMigrationDatabase, sqlitePath, type MigrationDatabase } from './lib/migrate-databases';
import { copyTables, nonEmptyTables } from './lib/migrate-tables';
import { loadConfig } from '../server/config';
import { openObjectStore } from '../server/storage/object-store';
import { copyUploads, folderStore, objectStoreFiles, type FileStore } from './lib/migrate-uploads';

const USAGE = 'usage: npm run migrate-data -- --from sqlite:PATH|postgres://… --to postgres://…|sqlite:PATH [--from-uploads DIR] [--to-uploads DIR]';

class Refused extends Error {}

interface Options {
  from: string;
  to: string;
  fromUploads: string;
  toUploads?: string;
}

function parseArgs(argv: string[]): Options {
  const named: Record<string, string> = {};
  for (let i = 0; i < argv.length; i += 2) {
    const [flag, value] = [argv[i], argv[i + 1]];
    if (!['--from', '--to', '--from-uploads', '--to-uploads'].includes(flag) || value === undefined) throw new Refused(`${USAGE}\n(did not understand ${flag})`);
    named[flag.slice(2)] = value;
  }
  if (!named.from || !named.to) throw new Refused(USAGE);
  if (named.from === named.to) throw new Refused('--from and --to name the same database');
  const dataDir = path.resolve(process.env.DATA_DIR || './data');
  return { from: named.from, to: named.to, fromUploads: named['from-uploads'] ?? path.join(dataDir, 'uploads'), toUploads: named['to-uploads'] };
}

const isPostgresUrl = (url: string) => /^postgres(ql)?:\/\//.test(url);
const describe = (url: string) => (isPostgresUrl(url) ? url.replace(/\/\/[^@/]*@/, '//…@') : sqlitePath(url));

/** Entity column types are read from DATABASE_URL when the entities first load: make them the target's. */
function columnTypesFor(target: string): void {
  if (isPostgresUrl(target)) process.env.DATABASE_URL = target;
  else delete process.env.DATABASE_URL;
}

/** Runs the product's migrations on the target. */
async function makeSchema(target: string): Promise<void> {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const { openDatabase } = require('../server/db/data-source') as typeof import('../server/db/data-source');
  const dataSource = await openDatabase(isPostgresUrl(target) ? target : sqlitePath(target));
  await dataSource.destroy();
}

function productMigrationNames(): string[] {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const { MIGRATIONS } = require('../server/db/data-source') as typeof import('../server/db/data-source');
  return MIGRATIONS.map((M) => new M().name).sort();
}

/** Where the data sheets go: --to-uploads DIR, else the bucket STORAGE_URL names, else nowhere (refused if there are any). */
function targetFiles(options: Options): FileStore | null {
  if (options.toUploads) return folderStore(options.toUploads);
  if (!process.env.STORAGE_URL) return null;
  const storage = loadConfig(process.env).storage;
  return objectStoreFiles(openObjectStore(storage), process.env.STORAGE_URL);
}

async function checkBeforeWriting(source: MigrationDatabase, target: MigrationDatabase, options: Options): Promise<void> {
  const full = await nonEmptyTables(target);
  if (full.length) throw new Refused(`the target database ${describe(options.to)} is not empty (rows in ${full.join(', ')}); migrate-data only writes into an empty database`);
  const applied = await source.migrationNames();
  const expected = productMigrationNames();
  if (applied.join() !== expected.join()) {
    throw new Refused(`the source database is not at this version's schema (${applied.length} of ${expected.length} migrations applied); start this version of Dilato on it once, then migrate`);
  }
  const files = await folderStore(options.fromUploads).list();
  const to = targetFiles(options);
  if (!to && files.length) throw new Refused(`the source holds ${files.length} data-sheet files in ${options.fromUploads}; name where they go with --to-uploads DIR or STORAGE_URL`);
  if (to) {
    const there = await to.list();
    if (there.length) throw new Refused(`the target uploads ${to.describe} are not empty (${there.length} files)`);
  }
}

async function main(): Promise<void> {
  const options = parseArgs(process.argv.slice(2));
  columnTypesFor(options.to);
  const started = Date.now();
  const source = await openMigrationDatabase(options.from, { readonly: true });
  try {
    let target = await openMigrationDatabase(options.to, { readonly: false });
    try {
      await checkBeforeWriting(source, target, options);
    } finally {
      await target.close();
    }
    console.log(`[migrate-data] ${describe(options.from)} → ${describe(options.to)}`);
    await makeSchema(options.to);
    target = await openMigrationDatabase(options.to, { readonly: false });
    try {
      const tables = await copyTables(source, target, console.log);
      const rows = tables.reduce((n, t) => n + t.rows, 0);
      console.log(`[migrate-data] ${tables.length} tables, ${rows} rows copied; counts and checksums agree`);
    } finally {
      await target.close();
    }
  } finally {
    await source.close();
  }
  const to = targetFiles(options);
  if (to) {
    const files = await copyUploads(folderStore(options.fromUploads), to);
    console.log(`[migrate-data] ${files.files} data-sheet files (${files.bytes} bytes) copied to ${to.describe}; sha256 agree`);
  }
  console.log(`[migrate-data] done in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}

main().catch((err) => {
  console.error(`[migrate-data] ${err instanceof Refused ? 'refused' : 'failed'}: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(err instanceof Refused ? 2 : 1);
});
