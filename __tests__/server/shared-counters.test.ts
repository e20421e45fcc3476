import { clearExpiredCounters, databaseCounters } from '../../server/db/shared-counters';
import { openTestDatabase, type TestDatabase } from './test-database';

let db: TestDatabase;
beforeEach(async () => {
  db = await openTestDatabase();
});
afterEach(() => db.close());

const keys = async () =>
  ((await db.dataSource.createQueryBuilder().select('r.key', 'key').from('rate_limit', 'r').orderBy('r.key').getRawMany()) as { key: string }[]).map((r) => r.key);

describe('counters kept in the database', () => {
  it('when two limiters on one database count one key, then they see one count (as two app instances would)', async () => {
    const first = databaseCounters(db.dataSource)('shared_test', 3, 60);
    const second = databaseCounters(db.dataSource)('shared_test', 3, 60);
    await first.penalty('203.0.113.7', 1);
    await second.penalty('203.0.113.7', 1);
    expect((await first.get('203.0.113.7'))?.consumedPoints).toBe(2);
    await expect(second.consume('203.0.113.7', 2)).rejects.toMatchObject({ consumedPoints: 4 });
  });

  it('when old windows are swept, then only counters whose window has passed go', async () => {
    const counter = databaseCounters(db.dataSource)('sweep_test', 5, 60);
    await counter.penalty('current', 1);
    await db.dataSource.createQueryBuilder().insert().into('rate_limit').values({ key: 'sweep_test:old', points: 3, expire: Date.now() - 1000 }).execute();
    expect(await keys()).toEqual(['sweep_test:current', 'sweep_test:old']);
    await clearExpiredCounters(db.dataSource);
    expect(await keys()).toEqual(['sweep_test:current']);
  });
});
