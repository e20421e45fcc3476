import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { ConfigError, loadConfig } from '../../server/config';
import { createDataSource, MIGRATIONS, openDatabase, rawDatabase } from '../../server/db/data-source';
import { seed } from '../../server/seed/seed';
import { User } from '../../server/users/user.entity';
import { createTestApp, HOST } from './test-app';
import { onSqliteOnly, openTestDatabase, testingOnPostgres } from './test-database';

describe('configuration', () => {
  it('when nothing is set, then the embedded defaults apply', () => {
    const c = loadConfig({});
    expect(c.port).toBe(8080);
    expect(c.dataDir).toBe(path.resolve('data'));
    expect(c.databasePath).toBe(path.resolve('data', 'dilato.sqlite'));
    expect(c.uploadsDir).toBe(path.resolve('data', 'uploads'));
    expect(c.seedDemo).toBe(true);
  });

  it('when PORT is not a number, then start-up stops with a message naming PORT', () => {
    expect(() => loadConfig({ PORT: 'eighty' })).toThrow(ConfigError);
    expect(() => loadConfig({ PORT: 'eighty' })).toThrow(/PORT: must be a number/);
    expect(() => loadConfig({ PORT: '70000' })).toThrow(/PORT: must be between 0 \(any free port, printed at start\) and 65535/);
    expect(loadConfig({ PORT: '0' }).port).toBe(0);
  });

  it('when SEED_DEMO or SMTP_URL are malformed, then each is named', () => {
    expect(() => loadConfig({ SEED_DEMO: 'maybe', SMTP_URL: 'mail.local' })).toThrow(/SEED_DEMO[\s\S]*SMTP_URL|SMTP_URL[\s\S]*SEED_DEMO/);
  });

  it('when SEED_DEMO=false, then demo seeding is off', () => {
    expect(loadConfig({ SEED_DEMO: 'false' }).seedDemo).toBe(false);
  });

  it('when TRUST_PROXY is a hop count or proxy addresses, then exactly those are trusted; "true" or junk stops start-up', () => {
    expect(loadConfig({}).trustProxy).toBe(false);
    expect(loadConfig({ TRUST_PROXY: 'false' }).trustProxy).toBe(false);
    expect(loadConfig({ TRUST_PROXY: '2' }).trustProxy).toBe(2);
    expect(loadConfig({ TRUST_PROXY: 'loopback, 10.0.0.0/8,fd00::1' }).trustProxy).toEqual(['loopback', '10.0.0.0/8', 'fd00::1']);
    expect(() => loadConfig({ TRUST_PROXY: 'true' })).toThrow(/TRUST_PROXY: give the number of proxies/);
    expect(() => loadConfig({ TRUST_PROXY: '10.0.0.0/33' })).toThrow(/TRUST_PROXY/);
    expect(() => loadConfig({ TRUST_PROXY: 'proxy.example' })).toThrow(/TRUST_PROXY/);
  });
});

onSqliteOnly()('database file (SQLite)', () => {
  let dir: string;
  beforeEach(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-db-'));
  });
  afterEach(() => fs.rmSync(dir, { recursive: true, force: true }));

  it('when a file database opens, then it runs in WAL mode with a busy timeout and foreign keys on', async () => {
    const ds = await openDatabase(path.join(dir, 'dilato.sqlite'));
    const db = rawDatabase(ds);
    expect(db.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(Number(db.pragma('busy_timeout', { simple: true }))).toBeGreaterThanOrEqual(5000);
    expect(db.pragma('foreign_keys', { simple: true })).toBe(1);
    await ds.destroy();
  });
});

describe('database', () => {
  it('when the demo seed runs twice, then the four demo users exist once each', async () => {
    const db = await openTestDatabase({ reopenable: true });
    expect((await seed(db.dataSource, { demo: true })).demoUsers).toBe(4);
    await db.dataSource.destroy();
    // Opened again from its file or URL: a second start on the same data.
    const second = await openDatabase(db.url);
    expect((await seed(second, { demo: true })).demoUsers).toBe(0);
    expect(await second.getRepository(User).count()).toBe(4);
    await second.destroy();
    await db.close();
  });

  it('when demo seeding is off, then no demo accounts exist', async () => {
    const db = await openTestDatabase();
    await seed(db.dataSource, { demo: false });
    expect(await db.dataSource.getRepository(User).count()).toBe(0);
    await db.close();
  });
});

describe('serving the web app', () => {
  it('when a deep link is asked, then the app page answers; unknown API routes still get JSON 404', async () => {
    const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-web-'));
    fs.writeFileSync(path.join(webDir, 'index.html'), '<!doctype html><title>Dilato</title><div id="root"></div>');
    fs.writeFileSync(path.join(webDir, 'app.js'), 'console.log(1)');
    const t = await createTestApp({ webDir });
    for (const link of ['/', '/sign-in', '/alloys/123']) {
      const res = await request(t.app).get(link).set('Host', HOST);
      expect(res.status).toBe(200);
      expect(res.text).toContain('<title>Dilato</title>');
    }
    const asset = await request(t.app).get('/app.js').set('Host', HOST);
    expect(asset.text).toBe('console.log(1)');
    const api = await request(t.app).get('/api/alloys-nope').set('Host', HOST);
    expect(api.status).toBe(404);
    expect(api.body.error.code).toBe('not_found');
    await t.close();
    fs.rmSync(webDir, { recursive: true, force: true });
  });
});

describe('choosing the database', () => {
  it('when DATABASE_URL names PostgreSQL, then the configuration says so; a non-postgres URL stops start-up naming it', () => {
    expect(loadConfig({ DATABASE_URL: 'postgres://dilato@db.internal:5432/dilato' })).toMatchObject({ onPostgres: true, databasePath: 'postgres://dilato@db.internal:5432/dilato' });
    expect(loadConfig({}).onPostgres).toBe(false);
    expect(() => loadConfig({ DATABASE_URL: 'mysql://db/dilato' })).toThrow(/DATABASE_URL: must be a postgres:\/\/ URL/);
  });

  it('when this process chose its column types for one kind of database, then opening the other kind is refused', () => {
    const other = testingOnPostgres() ? path.join(os.tmpdir(), 'never-made.sqlite') : 'postgres://nobody@127.0.0.1:1/none';
    expect(() => createDataSource(other)).toThrow(/column types are chosen at start/);
  });
});

describe('migration names', () => {
  it('when the migrations were rewritten for both databases, then the first twelve keep the names already recorded in existing databases', () => {
    // The `migrations` table of a database made before PostgreSQL support lists exactly these; a renamed one would run again.
    expect(MIGRATIONS.slice(0, 12).map((m) => new m().name)).toEqual([
      'UsersAndSessions1764600000000',
      'Catalogue1764600100000',
      'Jobs1764600200000',
      'UserPreferences1764600210000',
      'QuotesAndMail1764600300000',
      'FlexPartRatings1764600400000',
      'AlloyDataCautions1764600500000',
      'CurrencyRates1764600510000',
      'SignInAddresses1764600600000',
      'Activity1764600610000',
      'RunSupportsAndNearby1764600700000',
      'QuoteDeposits1764600900000',
    ]);
    expect(MIGRATIONS.every((m) => new m().name === m.name)).toBe(true);
  });
});
