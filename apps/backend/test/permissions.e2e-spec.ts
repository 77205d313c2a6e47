import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../src/auth/roles';
import { listRoutes, type RouteInfo } from './helpers/routes';
import { DEMO, ORIGIN, startTestApp, type TestApp } from './helpers/test-app';

/**
 * The permission matrix: every route the router knows, called as anonymous and as each
 * role, answers as its declaration says — 401 without a session, 403 for a role it does
 * not list (admin may always), and neither 401 nor 403 for a role it lists.
 */
const AS: { role: Role; email: string }[] = [
  { role: 'clerk', email: DEMO.clerk },
  { role: 'qa_lead', email: DEMO.qa },
  { role: 'purchasing', email: DEMO.buyer },
  { role: 'admin', email: DEMO.admin },
];

let t: TestApp;
let routes: RouteInfo[];
const tokens = new Map<Role, string>();
beforeAll(async () => {
  t = await startTestApp();
  routes = listRoutes(t.app).filter((r) => r.path !== '/api/auth/logout');
  for (const a of AS) tokens.set(a.role, await t.token(a.email));
}, 120_000);
afterAll(async () => t.close());

function call(route: RouteInfo, token?: string) {
  const url = route.path.replace(/:\w+/g, '1');
  const m = route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
  let req = t.http[m](url).set('Origin', ORIGIN);
  if (token) req = req.set('Authorization', `Bearer ${token}`);
  return m === 'get' ? req : req.send({});
}

describe('permission matrix', () => {
  it('covers the routes of every domain', () => {
    expect(routes.length).toBeGreaterThan(5);
  });

  it('refuses anonymous callers on every non-public route', async () => {
    for (const route of routes.filter((r) => !r.isPublic)) {
      const res = await call(route);
      expect(res.status, `${route.method} ${route.path}`).toBe(401);
    }
  });

  it('answers each role as the route declares', async () => {
    const wrong: string[] = [];
    for (const route of routes.filter((r) => !r.isPublic)) {
      for (const { role } of AS) {
        const allowed = role === 'admin' || (route.roles ?? []).includes(role);
        const res = await call(route, tokens.get(role));
        const refused = res.status === 401 || res.status === 403;
        if (allowed === refused) {
          wrong.push(
            `${role} ${route.method} ${route.path}: ${res.status} ${res.text.slice(0, 120)}`,
          );
        }
      }
    }
    expect(wrong).toEqual([]);
  }, 300_000);
});
