import { MikroORM } from '@mikro-orm/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { call } from './helpers/api';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

const supplier = (code: string, extra: object = {}) => ({
  name: `Test Supplier ${code}`,
  code,
  contactEmail: `quality@${code.toLowerCase()}.example`,
  ...extra,
});

describe('POST /api/suppliers', () => {
  it('lets purchasing and admin create; refuses clerk and QA lead', async () => {
    const buyer = await call(t, DEMO.buyer, 'post', '/api/suppliers', supplier('TS-B'));
    expect(buyer.status).toBe(201);
    expect(buyer.body).toMatchObject({
      name: 'Test Supplier TS-B',
      code: 'TS-B',
      contactEmail: 'quality@ts-b.example',
      status: 'approved',
      notes: null,
    });
    expect((await call(t, DEMO.admin, 'post', '/api/suppliers', supplier('TS-A'))).status).toBe(
      201,
    );
    for (const who of [DEMO.clerk, DEMO.qa]) {
      expect((await call(t, who, 'post', '/api/suppliers', supplier('TS-X'))).status).toBe(403);
    }
    expect((await t.http.post('/api/suppliers').send(supplier('TS-Y'))).status).toBe(401);
  });

  it('names the bad fields', async () => {
    const res = await call(t, DEMO.buyer, 'post', '/api/suppliers', {
      name: '',
      code: 'has space',
      contactEmail: 'not-an-address',
      status: 'blocked',
    });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(
      expect.arrayContaining([
        'name is required',
        'code must be 1 to 32 letters, digits, - or _',
        'contactEmail must be an e-mail address',
        'status must be one of approved, probation, suspended',
      ]),
    );
  });

  it('refuses a body nested too deeply before validating it, and saves nothing', async () => {
    let notes: unknown = 'deep';
    for (let i = 0; i < 100; i++) notes = { notes };
    const res = await call(t, DEMO.buyer, 'post', '/api/suppliers', {
      ...supplier('TS-DEEP'),
      notes,
    });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('Request body is nested too deeply (more than 16 levels)');
    const list = await call(t, DEMO.buyer, 'get', '/api/suppliers?q=TS-DEEP');
    expect(list.body.items).toEqual([]);
  });

  it('answers 409 for a code already used, whatever its case', async () => {
    await call(t, DEMO.buyer, 'post', '/api/suppliers', supplier('DUPE'));
    const res = await call(t, DEMO.buyer, 'post', '/api/suppliers', supplier('dupe'));
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('Supplier code DUPE is already used by another supplier');
  });

  it('audits the creation', async () => {
    const res = await call(t, DEMO.buyer, 'post', '/api/suppliers', supplier('AUD-1'));
    const em = t.app.get(MikroORM).em.fork();
    const events = await em.find(AuditEvent, { entityType: 'supplier', entityId: res.body.id });
    expect(events.map((e) => [e.action, e.actorEmail])).toEqual([['supplier.create', DEMO.buyer]]);
    expect(events[0].after).toMatchObject({ code: 'AUD-1' });
  });
});

describe('GET /api/suppliers', () => {
  it('lets every role read the list and one supplier', async () => {
    const made = await call(t, DEMO.buyer, 'post', '/api/suppliers', supplier('READ-1'));
    for (const who of [DEMO.clerk, DEMO.qa, DEMO.buyer, DEMO.admin]) {
      const list = await call(t, who, 'get', '/api/suppliers');
      expect(list.status).toBe(200);
      expect(list.body).toMatchObject({ page: 1, pageSize: 25 });
      const one = await call(t, who, 'get', `/api/suppliers/${made.body.id}`);
      expect(one.body.code).toBe('READ-1');
    }
    expect((await call(t, DEMO.clerk, 'get', '/api/suppliers/99999')).status).toBe(404);
    expect((await call(t, DEMO.clerk, 'get', '/api/suppliers/abc')).status).toBe(400);
  });

  it('filters by status and text, sorts and pages', async () => {
    await call(
      t,
      DEMO.buyer,
      'post',
      '/api/suppliers',
      supplier('ZZ-SUS', { status: 'suspended', name: 'Zephyr 50% Wire' }),
    );
    await call(
      t,
      DEMO.buyer,
      'post',
      '/api/suppliers',
      supplier('ZZ-PRO', { status: 'probation' }),
    );
    const suspended = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/suppliers?status=suspended&pageSize=100',
    );
    expect(suspended.body.items.length).toBeGreaterThan(0);
    for (const s of suspended.body.items) expect(s.status).toBe('suspended');
    const text = await call(t, DEMO.clerk, 'get', '/api/suppliers?q=zephyr%2050%25');
    expect(text.body.items.map((s: { code: string }) => s.code)).toEqual(['ZZ-SUS']);
    // A % in the search is the text "%", not a wildcard.
    const wildcard = await call(t, DEMO.clerk, 'get', '/api/suppliers?q=%25');
    expect(wildcard.body.items.map((s: { code: string }) => s.code)).toEqual(['ZZ-SUS']);
    const byCode = await call(t, DEMO.clerk, 'get', '/api/suppliers?sort=code:desc&pageSize=100');
    const codes = byCode.body.items.map((s: { code: string }) => s.code);
    expect(codes).toEqual([...codes].sort().reverse());
    expect(byCode.body.total).toBe(codes.length);
    const page2 = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/suppliers?sort=code:desc&pageSize=2&page=2',
    );
    expect(page2.body.items.map((s: { code: string }) => s.code)).toEqual(codes.slice(2, 4));
    const bad = await call(t, DEMO.clerk, 'get', '/api/suppliers?sort=email:asc&status=gone');
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(['status must be one of approved, probation, suspended']);
  });
});

describe('PATCH /api/suppliers/:id', () => {
  it('changes status and contact, audited with before and after; refuses clerk', async () => {
    const made = await call(t, DEMO.buyer, 'post', '/api/suppliers', supplier('PAT-1'));
    const id = made.body.id as number;
    expect(
      (await call(t, DEMO.clerk, 'patch', `/api/suppliers/${id}`, { status: 'suspended' })).status,
    ).toBe(403);
    expect(
      (await call(t, DEMO.qa, 'patch', `/api/suppliers/${id}`, { status: 'suspended' })).status,
    ).toBe(403);
    const res = await call(t, DEMO.buyer, 'patch', `/api/suppliers/${id}`, {
      version: made.body.version,
      status: 'suspended',
      contactEmail: null,
      notes: 'Two undersized lots in a row',
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      status: 'suspended',
      contactEmail: null,
      notes: 'Two undersized lots in a row',
    });
    const bad = await call(t, DEMO.buyer, 'patch', `/api/suppliers/${id}`, {
      version: res.body.version,
      contactEmail: 'x@',
    });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(['contactEmail must be an e-mail address']);
    const dupe = await call(t, DEMO.admin, 'patch', `/api/suppliers/${id}`, {
      version: res.body.version,
      code: 'TS-B',
    });
    expect(dupe.status).toBe(409);
    const em = t.app.get(MikroORM).em.fork();
    const [event] = await em.find(AuditEvent, {
      entityType: 'supplier',
      entityId: id,
      action: 'supplier.status',
    });
    expect(event.before).toMatchObject({
      status: 'approved',
      contactEmail: 'quality@pat-1.example',
    });
    expect(event.after).toMatchObject({ status: 'suspended', contactEmail: null });
  });
});

describe('demo catalog', () => {
  it('has invented suppliers in every status and products whose kit warns about its ground', async () => {
    const res = await call(t, DEMO.clerk, 'get', '/api/suppliers?q=.example&pageSize=100');
    const statuses = new Set(res.body.items.map((s: { status: string }) => s.status));
    expect([...statuses].sort()).toEqual(['approved', 'probation', 'suspended']);
    const kits = await call(t, DEMO.clerk, 'get', '/api/products?kind=kit&pageSize=100');
    const warned = kits.body.items.filter((p: { warnings: string[] }) => p.warnings.length > 0);
    expect(warned.map((p: { warnings: string[] }) => p.warnings[0])).toContain(
      'Power is 4 AWG but ground is 8 AWG: ground should be sized like power (common practice).',
    );
    const metric = await call(t, DEMO.clerk, 'get', '/api/products?q=25%20mm');
    expect(metric.body.items[0].conductors[0]).toMatchObject({
      gauge: '25 mm²',
      gaugeSystem: 'metric',
    });
  });
});
