import request from 'supertest';
import { ROLES, type Role } from '../../shared/schemas/auth';
import { client, createTestApp, expectErrorShape, HOST, ORIGIN, signedIn, type TestApp } from './test-app';
import { routeFixtures, routeList, routeUrl, type RouteFixtures } from './route-list';

type Who = 'anyone' | 'signed-in' | 'token' | Role[];
const EDITORS: Role[] = ['engineer', 'admin'];
const SHOP_FLOOR: Role[] = ['fabricator', 'engineer', 'admin'];
const SELLERS: Role[] = ['sales', 'admin'];
const ADMIN: Role[] = ['admin'];

/** Who may use each route. A route the app has without a row here fails the first test. */
const MATRIX: Record<string, Who> = {
  'GET /api/health': 'anyone',
  'GET /api/auth/me': 'anyone',
  'POST /api/auth/sign-in': 'anyone',
  'POST /api/auth/sign-out': 'anyone',
  'GET /api/public/quotes/:token': 'token',
  'POST /api/public/quotes/:token/accept': 'token',
  'POST /api/public/quotes/:token/decline': 'token',
  'POST /api/public/quotes/:token/deposit': 'token',
  // The payment provider's webhook: no session and no Origin; its signature is checked instead (payments-webhook tests).
  'POST /api/payments/webhook': 'anyone',

  'GET /api/alloys': 'signed-in',
  'GET /api/alloys/:id': 'signed-in',
  'GET /api/alloys/:id/revisions': 'signed-in',
  'GET /api/alloys/:id/versions': 'signed-in',
  'GET /api/alloys/:id/versions/:version': 'signed-in',
  'GET /api/alloys/export.csv': 'signed-in',
  'GET /api/alloys/:id/review': EDITORS,
  'GET /api/alloys/imports/:id': EDITORS,
  'POST /api/alloys': EDITORS,
  'POST /api/alloys/import': EDITORS,
  'PATCH /api/alloys/:id': EDITORS,
  'POST /api/alloys/:id/datasheets': EDITORS,
  'POST /api/alloys/:id/publish': ADMIN,
  'POST /api/alloys/:id/retire': ADMIN,
  'POST /api/alloys/:id/restore': ADMIN,
  'GET /api/datasheets/:id': 'signed-in',
  // After the GET row: the first allowed column removes the fixture's data sheet, later ones get 404.
  'DELETE /api/datasheets/:id': EDITORS,
  'GET /api/alloys/review-queue': ADMIN,
  'POST /api/alloys/:id/submit': EDITORS,
  'POST /api/alloys/:id/send-back': ADMIN,
  'GET /api/sources': 'signed-in',
  'POST /api/sources': EDITORS,
  'GET /api/flex-parts': 'signed-in',
  'POST /api/flex-parts': ADMIN,
  'PATCH /api/flex-parts/:id': ADMIN,
  'POST /api/calc/run': 'signed-in',

  'GET /api/jobs': 'signed-in',
  'GET /api/jobs/:id': 'signed-in',
  'GET /api/jobs/:id/activity': 'signed-in',
  'GET /api/jobs/:id/deposits': 'signed-in',
  'GET /api/jobs/:id/weld-plan': 'signed-in',
  'POST /api/jobs': SHOP_FLOOR,
  'PATCH /api/jobs/:id': SHOP_FLOOR,
  'POST /api/jobs/:id/runs': SHOP_FLOOR,
  'PUT /api/jobs/:id/runs/order': SHOP_FLOOR,
  'GET /api/runs/:id': 'signed-in',
  'GET /api/runs/:id/activity': 'signed-in',
  'GET /api/runs/:id/compare': 'signed-in',
  'PATCH /api/runs/:id': SHOP_FLOOR,
  'DELETE /api/runs/:id': SHOP_FLOOR,
  'POST /api/runs/:id/duplicate': SHOP_FLOOR,

  'GET /api/me/preferences': 'signed-in',
  'PUT /api/me/preferences': 'signed-in',
  'GET /api/currency-rates': 'signed-in',
  'PUT /api/currency-rates/:from': ADMIN,
  'DELETE /api/currency-rates/:from': ADMIN,
  'GET /api/settings': 'signed-in',
  'PUT /api/settings': ADMIN,
  'GET /api/outbox': SELLERS,
  'GET /api/outbox/:id': SELLERS,
  'GET /api/quotes': 'signed-in',
  'GET /api/quotes/:id': 'signed-in',
  'GET /api/quotes/:id/activity': 'signed-in',
  'POST /api/quotes': SELLERS,
  'PATCH /api/quotes/:id': SELLERS,
  'GET /api/quotes/:id/email-preview': SELLERS,
  'POST /api/quotes/:id/send': SELLERS,
  'POST /api/quotes/:id/limit-overrides': EDITORS,
  'POST /api/quotes/:id/deposit/refund': ADMIN,
  'GET /api/weld-rules': 'signed-in',
  'GET /api/weld-rules/:id': 'signed-in',
  'GET /api/weld-rules/:id/revisions': 'signed-in',
  'POST /api/weld-rules': EDITORS,
  'PATCH /api/weld-rules/:id': EDITORS,
  'DELETE /api/weld-rules/:id': EDITORS,
  'GET /api/users': ADMIN,
  'POST /api/users': ADMIN,
  'PATCH /api/users/:id': ADMIN,
};

type Column = Role | 'anonymous' | 'customer';
const COLUMNS: Column[] = ['anonymous', ...ROLES, 'customer'];

function allowed(who: Who, column: Column): boolean {
  if (who === 'anyone') return true;
  // The customer link works for whoever holds the token; the anonymous column holds a made-up one.
  if (who === 'token') return column !== 'anonymous';
  if (column === 'anonymous' || column === 'customer') return false;
  return who === 'signed-in' || who.includes(column);
}

let t: TestApp;
let fx: RouteFixtures;

beforeAll(async () => {
  t = await createTestApp();
  fx = await routeFixtures(t);
}, 60_000);
afterAll(() => t.close());

const url = (route: string, column: Column) => routeUrl(route, fx, column === 'anonymous');

describe('the role matrix', () => {
  it('when the app has a route, then the matrix has its row, and the other way round', () => {
    expect(routeList(t.app)).toEqual(Object.keys(MATRIX).sort());
  });

  const cells = Object.entries(MATRIX).flatMap(([route, who]) => COLUMNS.map((column) => ({ route, who, column })));
  it.each(cells)('$route as $column', async ({ route, who, column }) => {
    const [method] = route.split(' ');
    const c = column === 'anonymous' || column === 'customer' ? client(t.app) : await signedIn(t.app, column);
    const m = method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
    const res = method === 'GET' ? await c.get(url(route, column)) : await c[m](url(route, column)).send({});
    expect(res.status).toBeLessThan(500);
    if (who === 'token' && column === 'anonymous') {
      expect([400, 404]).toContain(res.status);
    } else if (allowed(who, column)) {
      expect([401, 403]).not.toContain(res.status);
    } else if (column === 'anonymous' || column === 'customer') {
      expect(res.status).toBe(401);
      expectErrorShape(res.body, 'signed_out');
    } else {
      expect(res.status).toBe(403);
      expectErrorShape(res.body, 'forbidden');
    }
  });

  it('when a request comes with no Origin, then no state-changing route but the signed webhook accepts it', async () => {
    const webhook = 'POST /api/payments/webhook';
    for (const route of Object.keys(MATRIX).filter((r) => !r.startsWith('GET ') && r !== webhook)) {
      const [method] = route.split(' ');
      const res = await request(t.app)[method.toLowerCase() as 'post'](url(route, 'customer')).set('Host', HOST).send({});
      expect([route, res.status]).toEqual([route, 403]);
    }
    expect(ORIGIN).toMatch(/^http:/);
    const unsigned = await request(t.app).post('/api/payments/webhook').set('Host', HOST).set('Content-Type', 'application/json').send('{}');
    expect(unsigned.status).toBe(400);
    expectErrorShape(unsigned.body, 'bad_signature');
  });
});
