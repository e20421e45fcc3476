import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { databaseKind } from './column-types';
import { Alloy, AlloyRevision, AlloyVersion, Datasheet, PropertyPoint, Source } from '../catalogue/catalogue.entities';
import { FlexPartRow } from '../flex-parts/flex-part.entity';
import { User } from '../users/user.entity';
import { Job, JobRun } from '../jobs/job.entities';
import { UserPreference } from '../preferences/user-preference.entity';
import { MailMessage } from '../mail/mail-message.entity';
import { Quote, QuoteEvent, QuoteLimitOverride } from '../quotes/quote.entities';
import { ShopSettingsRow } from '../settings/shop-settings.entity';
import { SignInAddress } from '../auth/sign-in-address.entity';
import { ActivityEntry } from '../activity/activity.entity';
import { Activity1764600610000 } from './migrations/1764600610000-activity';
import { RunSupportsAndNearby1764600700000 } from './migrations/1764600700000-run-supports-and-nearby';
import { SignInAddresses1764600600000 } from './migrations/1764600600000-sign-in-addresses';
import { QuotesAndMail1764600300000 } from './migrations/1764600300000-quotes-and-mail';
import { Jobs1764600200000 } from './migrations/1764600200000-jobs';
import { UserPreferences1764600210000 } from './migrations/1764600210000-user-preferences';
import { UsersAndSessions1764600000000 } from './migrations/1764600000000-users-and-sessions';
import { Catalogue1764600100000 } from './migrations/1764600100000-catalogue';
import { FlexPartRatings1764600400000 } from './migrations/1764600400000-flex-part-ratings';
import { AlloyDataCautions1764600500000 } from './migrations/1764600500000-alloy-data-cautions';
import { CurrencyRates1764600510000 } from './migrations/1764600510000-currency-rates';
import { CurrencyRate } from '../currency/currency-rate.entity';
import { Deposit, PaymentEventSeen } from '../payments/deposit.entities';
import { QuoteDeposits1764600900000 } from './migrations/1764600900000-quote-deposits';
import { WeldRuleRevision, WeldRuleRow } from '../welds/weld-rule.entities';
import { WeldRules1764601200000 } from './migrations/1764601200000-weld-rules';
import { RunFlangeAlloys1764601210000 } from './migrations/1764601210000-run-flange-alloys';
import { FlexPartCuff1764601220000 } from './migrations/1764601220000-flex-part-cuff';
import { QuoteLimitOverrides1764601300000 } from './migrations/1764601300000-quote-limit-overrides';
import { AlloyReview1764601310000 } from './migrations/1764601310000-alloy-review';
import { CacheStamp } from '../cache/cache-stamp.entity';
import { ListIndexes1764601600000 } from './migrations/1764601600000-list-indexes';
import { DesignationKey1764601610000 } from './migrations/1764601610000-designation-key';
import { CacheStamps1764601620000 } from './migrations/1764601620000-cache-stamps';
import { InsertionOrder1764601500000 } from './migrations/1764601500000-insertion-order';
import { RateLimits1764601510000 } from './migrations/1764601510000-rate-limits';
import { ImportJobs1764601520000 } from './migrations/1764601520000-import-jobs';
import { ImportJobRow } from '../catalogue/csv-import/import-job.entity';

export const ENTITIES = [
  User,
  Source,
  Alloy,
  AlloyVersion,
  PropertyPoint,
  AlloyRevision,
  Datasheet,
  FlexPartRow,
  Job,
  JobRun,
  UserPreference,
  MailMessage,
  ShopSettingsRow,
  Quote,
  QuoteEvent,
  CurrencyRate,
  SignInAddress,
  ActivityEntry,
  Deposit,
  PaymentEventSeen,
  WeldRuleRow,
  WeldRuleRevision,
  QuoteLimitOverride,
  CacheStamp,
  ImportJobRow,
];
export const MIGRATIONS = [
  UsersAndSessions1764600000000,
  Catalogue1764600100000,
  Jobs1764600200000,
  UserPreferences1764600210000,
  QuotesAndMail1764600300000,
  FlexPartRatings1764600400000,
  AlloyDataCautions1764600500000,
  CurrencyRates1764600510000,
  SignInAddresses1764600600000,
  Activity1764600610000,
  RunSupportsAndNearby1764600700000,
  QuoteDeposits1764600900000,
  WeldRules1764601200000,
  RunFlangeAlloys1764601210000,
  FlexPartCuff1764601220000,
  QuoteLimitOverrides1764601300000,
  AlloyReview1764601310000,
  ListIndexes1764601600000,
  DesignationKey1764601610000,
  CacheStamps1764601620000,
  InsertionOrder1764601500000,
  RateLimits1764601510000,
  ImportJobs1764601520000,
];

/**
 * `database` is a SQLite file path (':memory:' for tests) or a `postgres://` URL. Entities pick their
 * column types from DATABASE_URL when they load, so the URL opened must be of the same kind.
 */
export function createDataSource(database: string): DataSource {
  const kind = databaseKind(database);
  if (kind !== databaseKind()) {
    throw new Error(`cannot open a ${kind} database in a process whose DATABASE_URL names ${databaseKind()}: column types are chosen at start`);
  }
  if (kind === 'postgres') {
    return new DataSource({
      type: 'postgres',
      url: database,
      entities: ENTITIES,
      migrations: MIGRATIONS,
      synchronize: false,
      migrationsRun: false,
      poolSize: 10,
    });
  }
  return new DataSource({
    type: 'better-sqlite3',
    database,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    synchronize: false,
    migrationsRun: false,
    enableWAL: database !== ':memory:',
    timeout: 5000,
    prepareDatabase: (db: { pragma: (sql: string) => unknown }) => {
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
    },
  });
}

/** Opens the database and brings its schema up to date. */
export async function openDatabase(database: string): Promise<DataSource> {
  const dataSource = createDataSource(database);
  await dataSource.initialize();
  await withStartUpLock(dataSource, () => dataSource.runMigrations({ transaction: 'each' }));
  // SQLite plans joins from table statistics it gathers only when asked; without them the alloy list scans the wide version rows.
  if (dataSource.options.type === 'better-sqlite3') await dataSource.query('PRAGMA optimize=0x10002');
  return dataSource;
}

export const isPostgres = (dataSource: DataSource) => dataSource.options.type === 'postgres';

/** Any fixed number names the lock; every Dilato instance uses this one. */
const START_UP_LOCK = 0xd11a70;

/**
 * Runs start-up work (migrations, seeds) while holding a PostgreSQL advisory lock on a connection of its
 * own, so instances started together migrate and seed one after the other. SQLite serves one process.
 */
export async function withStartUpLock<T>(dataSource: DataSource, work: () => Promise<T>): Promise<T> {
  if (!isPostgres(dataSource)) return work();
  const lock = dataSource.createQueryRunner();
  await lock.connect();
  try {
    await lock.query('SELECT pg_advisory_lock($1)', [START_UP_LOCK]);
    try {
      return await work();
    } finally {
      await lock.query('SELECT pg_advisory_unlock($1)', [START_UP_LOCK]);
    }
  } finally {
    await lock.release();
  }
}

/** The raw better-sqlite3 handle under TypeORM, shared with lucia's SQLite session adapter. */
export function rawDatabase(dataSource: DataSource): import('better-sqlite3').Database {
  return (dataSource.driver as unknown as { databaseConnection: import('better-sqlite3').Database }).databaseConnection;
}

/** TypeORM's pg pool, shared with lucia's PostgreSQL session adapter. */
export function rawPool(dataSource: DataSource): import('pg').Pool {
  return (dataSource.driver as unknown as { master: import('pg').Pool }).master;
}
