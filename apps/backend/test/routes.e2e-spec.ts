import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOMAIN_MODULES } from '../src/app.module';
import { literalRoutesFirst, shadows } from '../src/common/route-order';
import { listRoutes } from './helpers/routes';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

describe('route declarations', () => {
  it('finds the routes of the router', () => {
    const routes = listRoutes(t.app);
    expect(routes.map((r) => `${r.method} ${r.path}`)).toEqual(
      expect.arrayContaining(['POST /api/auth/login', 'GET /api/health', 'GET /api/users']),
    );
  });

  it('has every route either public or declaring its roles', () => {
    const undeclared = listRoutes(t.app).filter(
      (r) => !r.isPublic && (!r.roles || r.roles.length === 0),
    );
    expect(undeclared.map((r) => `${r.method} ${r.path} (${r.controller}.${r.handler})`)).toEqual(
      [],
    );
  });

  it('has every route name its answer, and the document describe it', async () => {
    const unnamed = listRoutes(t.app).filter((r) => !r.answer);
    expect(unnamed.map((r) => `${r.method} ${r.path} (${r.controller}.${r.handler})`)).toEqual([]);
    const doc = (await t.http.get('/api/docs-json')).body as {
      paths: Record<string, Record<string, { responses: Record<string, unknown> }>>;
      components: { schemas: Record<string, unknown> };
    };
    const described = listRoutes(t.app).filter((r) => {
      const path = r.path.replace(/:(\w+)/g, '{$1}');
      const op = doc.paths[path]?.[r.method.toLowerCase()];
      return op && Object.keys(op.responses).some((status) => status.startsWith('2'));
    });
    expect(described.length).toBe(listRoutes(t.app).length);
    expect(Object.keys(doc.components.schemas)).toEqual(
      expect.arrayContaining(['LotDetail', 'LotSummaryPage', 'SupplierScorecard']),
    );
  });

  it("keeps public routes to sign-in, health and the supplier's token-checked page", () => {
    const open = listRoutes(t.app)
      .filter((r) => r.isPublic)
      .map((r) => `${r.method} ${r.path}`);
    expect(open.sort()).toEqual([
      'GET /api/health',
      'GET /api/supplier-portal/:token',
      'GET /api/supplier-portal/:token/evidence.pdf',
      'GET /api/supplier-portal/:token/photos/:n',
      'POST /api/auth/login',
      'POST /api/supplier-portal/:token/attachments',
      'POST /api/supplier-portal/:token/response',
    ]);
  });
});

/** What an answer is, without the values that differ between two fresh apps (times, ids). */
function shapeOf(value: unknown): unknown {
  if (Array.isArray(value)) return value.length ? [shapeOf(value[0])] : [];
  if (value && typeof value === 'object') {
    return Object.fromEntries(
      Object.entries(value)
        .sort(([a], [b]) => a.localeCompare(b))
        .map(([k, v]) => [k, shapeOf(v)]),
    );
  }
  return value === null ? null : typeof value;
}

describe('route order', () => {
  it('moves a literal route before a parameter route that would take it, and nothing else', () => {
    expect(shadows('/api/lots/:id', '/api/lots/export.csv')).toBe(true);
    expect(shadows('/api/lots/:id', '/api/lots')).toBe(false);
    expect(shadows('/api/lots/:id', '/api/returns/export.csv')).toBe(false);
    expect(shadows('/api/lots/:id/tag', '/api/lots/7/tag')).toBe(true);
    const get = (path: string) => ({ route: { path, methods: { get: true } } });
    const stack = [
      { name: 'body' },
      get('/api/lots/:id'),
      get('/api/users'),
      get('/api/lots/export.csv'),
      { route: { path: '/api/{*splat}', methods: { get: true, post: true } } },
      get('/api/returns/:id'),
      get('/api/returns/export.csv'),
    ];
    literalRoutesFirst(stack);
    expect(
      stack.map((l) => ('route' in l && l.route ? l.route.path : (l as { name: string }).name)),
    ).toEqual([
      'body',
      '/api/lots/export.csv',
      '/api/lots/:id',
      '/api/users',
      '/api/{*splat}',
      '/api/returns/export.csv',
      '/api/returns/:id',
    ]);
  });

  it('answers every route alike with the domain modules in reverse order', async () => {
    const reversed = await startTestApp({}, {}, [...DOMAIN_MODULES].reverse());
    try {
      // Each GET route with its parameters filled, the literal paths a parameter route sits
      // beside among them (/lots/export.csv beside /lots/:id), a bad id and an unknown path.
      const paths = [
        ...listRoutes(t.app)
          .filter((r) => r.method === 'GET')
          .map((r) => r.path.replace(/:\w+/g, '1')),
        '/api/lots/export.csv?status=on_hold',
        '/api/lots/received-before?poNumber=PO-1&packingSlip=PS-1',
        '/api/lots/not-an-id',
        '/api/no-such-thing',
      ];
      expect(paths).toContain('/api/lots/export.csv');
      const answer = async (app: TestApp, path: string) => {
        const res = await app.http
          .get(path)
          .set('authorization', `Bearer ${await app.token(DEMO.admin)}`);
        const type = String(res.headers['content-type'] ?? '').split(';')[0];
        const shape = type === 'application/json' ? shapeOf(res.body) : type;
        return `${path} ${res.status} ${JSON.stringify(shape)}`;
      };
      for (const path of paths) {
        expect(await answer(reversed, path)).toBe(await answer(t, path));
      }
    } finally {
      await reversed.close();
    }
  });
});
