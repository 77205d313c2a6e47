import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { requestFields } from './helpers/openapi-fields';
import { listRoutes, type RouteInfo } from './helpers/routes';
import { DEMO, ORIGIN, startTestApp, type TestApp } from './helpers/test-app';

/**
 * Generated abuse for every route the router knows: wrong types, missing and extra fields,
 * huge and unicode strings, negative and non-finite numbers, deep nesting, odd ids and
 * query strings. Never a 5xx, never a stack trace or SQL text in an answer.
 */
// At least 2 000 generated cases in all, spread over the routes (ABUSE_MIN_TOTAL to change).
const MIN_TOTAL = Number(process.env.ABUSE_MIN_TOTAL ?? 2000);

let t: TestApp;
let token: string;
let routes: RouteInfo[];
let fields: Map<string, string[]>;
beforeAll(async () => {
  t = await startTestApp();
  token = await t.token(DEMO.admin);
  // Signing out ends the admin session every later request runs on (odd-input.e2e-spec.ts
  // sends odd bodies to sign-out on a session of its own).
  routes = listRoutes(t.app).filter((r) => r.path !== '/api/auth/logout');
  fields = await requestFields(t);
}, 120_000);
afterAll(async () => t.close());

const nasty = fc.oneof(
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'grapheme', maxLength: 40 }),
  fc.constantFrom(
    '',
    ' ',
    '\u0000',
    '💥🔌',
    '=HYPERLINK("x")',
    "'; drop table lots; --",
    '../../etc/passwd',
    'a'.repeat(20_000),
  ),
  fc.integer(),
  fc.constantFrom(-1, 0, -0.0001, 1e308, -1e308, 2 ** 53 + 1, 0.1 + 0.2),
  fc.double(),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.integer(), { maxLength: 5 }),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.string({ maxLength: 8 }), { maxKeys: 4 }),
);

function deep(levels: number): unknown {
  let v: unknown = 1;
  for (let i = 0; i < levels; i++) v = { a: [v] };
  return v;
}

const idValue = fc.constantFrom(
  '1',
  '2',
  '0',
  '-1',
  'abc',
  '1.5',
  '99999999999999999999',
  '%F0%9F%92%A5',
  '1e3',
  ' 1',
);

function bodyFor(route: RouteInfo) {
  const known = fields.get(`${route.method} ${route.path}`) ?? [];
  const keys = [...known, 'extra', '__proto__', 'constructor', 'id'];
  return fc.oneof(
    { weight: 5, arbitrary: fc.dictionary(fc.constantFrom(...keys), nasty, { maxKeys: 8 }) },
    { weight: 1, arbitrary: fc.constantFrom(deep(50), deep(2000), [], 'text', 42, null) },
    { weight: 1, arbitrary: fc.anything({ maxDepth: 3 }) },
  );
}

const RAW_BODIES = ['{"quantity": 1e999}', '{"a":', '[[[[[[[[[[', '{"massG": NaN}', '\u0000'];

function assertSafe(route: RouteInfo, status: number, text: string) {
  const where = `${route.method} ${route.path} → ${status}: ${text.slice(0, 300)}`;
  expect(status, where).toBeLessThan(500);
  expect(text, where).not.toMatch(
    /\bat .+\.(ts|js):\d+|node_modules|SQLITE_|select .* from|insert into|syntax error at/i,
  );
}

describe('abuse of every route', () => {
  it(`answers at least ${MIN_TOTAL} generated requests without a 5xx or a leak`, async () => {
    let total = 0;
    for (const route of routes) {
      const path = (ids: string[]) => {
        let i = 0;
        return route.path.replace(/:\w+/g, () => ids[i++ % ids.length]);
      };
      await fc.assert(
        fc.asyncProperty(
          fc.array(idValue, { minLength: 1, maxLength: 3 }),
          bodyFor(route),
          fc.dictionary(
            fc.constantFrom(
              'page',
              'pageSize',
              'sort',
              'q',
              'status',
              'from',
              'to',
              'supplierId',
              'x',
            ),
            fc.string({ maxLength: 30 }),
            { maxKeys: 4 },
          ),
          async (ids, body, query) => {
            const url = path(ids);
            const m = route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
            let req = t.http[m](url)
              .query(query)
              .set('Authorization', `Bearer ${token}`)
              .set('Origin', ORIGIN);
            if (m !== 'get') {
              req = req
                .set('Content-Type', 'application/json')
                .send(JSON.stringify(body) ?? 'null');
            }
            const res = await req;
            total++;
            assertSafe(route, res.status, res.text ?? '');
          },
        ),
        {
          numRuns: Math.max(10, Math.ceil(MIN_TOTAL / routes.length)),
          seed: 20261201,
          endOnFailure: true,
        },
      );
      if (route.method !== 'GET') {
        for (const raw of RAW_BODIES) {
          const res = await t.http[route.method.toLowerCase() as 'post'](path(['1']))
            .set('Authorization', `Bearer ${token}`)
            .set('Content-Type', 'application/json')
            .send(raw);
          total++;
          assertSafe(route, res.status, res.text ?? '');
        }
      }
    }
    expect(total).toBeGreaterThanOrEqual(MIN_TOTAL);
  }, 600_000);
});
