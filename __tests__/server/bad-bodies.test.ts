import fc from 'fast-check';
import { client, createTestApp, signedIn, type TestApp } from './test-app';
import { routeFixtures, routeList, routeUrl, type RouteFixtures } from './route-list';

/** Field names the API's bodies use, so that generated bodies reach the validation of real fields. */
const FIELDS = [
  'name', 'email', 'password', 'role', 'active', 'note', 'notes', 'designation', 'uns', 'family', 'densityKgM3', 'densitySourceId',
  'maxContinuousC', 'maxIntermittentC', 'limitsSourceId', 'pricePerKg', 'currency', 'priceSetOn', 'priceIsDemo', 'referenceTempC',
  'warningRanges', 'cte', 'modulus', 'yield', 'code', 'boreMm', 'liveLengthMm', 'price', 'kind', 'title', 'url', 'jobId',
  'customerName', 'customerEmail', 'customerCompany', 'options', 'validUntil', 'message', 'optionIndex', 'reason', 'runIds',
  'alloyId', 'tube', 'segments', 'installTempC', 'joint', 'startFixing', 'endFixing', 'position', 'status', 'customer',
  'application', 'unitSystem', 'shopName', 'labourRatePerHour', 'alloy', 'flex', 'slip',
];

const value = fc.oneof(
  fc.jsonValue({ maxDepth: 3 }),
  fc.constantFrom(null, '', ' ', '\u0000', 'x'.repeat(5000), -1, 0, 1e308, -1e308, Number.MAX_SAFE_INTEGER, true, [], {}, '2026-13-45', '=1+1'),
  fc.string({ unit: 'binary', maxLength: 50 }),
);
const object = fc.dictionary(fc.oneof(fc.constantFrom(...FIELDS), fc.string({ maxLength: 10 })), value, { maxKeys: 8 });
/** A JSON body (any value, most often an object with API field names), or raw text that may not be JSON at all. */
const body = fc.oneof(
  { weight: 6, arbitrary: object.map((o) => ({ json: o as unknown })) },
  { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 2 }).map((json) => ({ json: json as unknown })) },
  { weight: 1, arbitrary: fc.string({ maxLength: 200 }).map((raw) => ({ raw })) },
);

let t: TestApp;
let fx: RouteFixtures;
beforeAll(async () => {
  t = await createTestApp();
  fx = await routeFixtures(t);
}, 60_000);
afterAll(() => t.close());

const RUNS = 200;

describe('generated bad bodies', () => {
  const mutating = () => routeList(t.app).filter((r) => !r.startsWith('GET '));

  it('when every mutating route gets 200 generated bodies, then none answers 5xx and every error is in the one shape', async () => {
    const admin = await signedIn(t.app, 'admin');
    const routes = mutating();
    expect(routes.length).toBeGreaterThan(25);
    for (const route of routes) {
      const [method] = route.split(' ');
      // Signing out would end the admin's session for the routes after it.
      const c = route.endsWith('/sign-out') ? client(t.app) : admin;
      await fc.assert(
        fc.asyncProperty(body, async (b) => {
          const req = c[method.toLowerCase() as 'post'](routeUrl(route, fx));
          const res = await req.set('Content-Type', 'application/json').send('raw' in b ? b.raw : JSON.stringify(b.json));
          const failure = `${route} answered ${res.status} ${JSON.stringify(res.body).slice(0, 300)} to ${JSON.stringify(b).slice(0, 300)}`;
          if (res.status >= 500) throw new Error(failure);
          if (res.status >= 400) {
            const e = res.body?.error;
            const shaped =
              e && typeof e.code === 'string' && /^[a-z][a-z0-9_]*$/.test(e.code) && typeof e.message === 'string' && Object.keys(res.body).length === 1 &&
              Object.keys(e).every((k) => ['code', 'message', 'fields'].includes(k));
            if (!shaped) throw new Error(`not in the error shape: ${failure}`);
          }
        }),
        { numRuns: RUNS, seed: 11 },
      );
    }
  }, 300_000);
});
