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
