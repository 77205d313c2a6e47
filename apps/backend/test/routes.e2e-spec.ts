import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listRoutes } from './helpers/routes';
import { startTestApp, type TestApp } from './helpers/test-app';

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
