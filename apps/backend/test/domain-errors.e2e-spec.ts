import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { call } from './helpers/api';
import { makeSupplier, spoolBody } from './helpers/catalog';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

/** The field of each problem an error body lists. */
const fields = (body: { errors: { field: string | null }[] }) => body.errors.map((e) => e.field);

describe('domain errors carry their field (errors as data)', () => {
  it('puts a control character on the body field, query parameter or nested field holding it', async () => {
    const body = await call(t, DEMO.buyer, 'post', '/api/suppliers', {
      name: 'Bell\u0007 Wire',
      code: 'CTL-1',
    });
    expect(body.status).toBe(400);
    expect(body.body.errors).toEqual([
      {
        field: 'name',
        message: 'name must not contain control characters (tab and line breaks are allowed)',
      },
    ]);
    const query = await call(t, DEMO.qa, 'get', '/api/lots?q=a%00b');
    expect(query.status).toBe(400);
    expect(fields(query.body)).toEqual(['q']);
    const supplier = await makeSupplier(t, 'CTL-2');
    const nested = await call(t, DEMO.qa, 'post', '/api/products', {
      ...spoolBody(supplier.id, 'CTL-SKU'),
      conductors: [{ purpose: 'power', gauge: '4\u0000', claimedMaterial: 'copper' }],
    });
    expect(nested.status).toBe(400);
    expect(fields(nested.body)).toEqual(['conductors.0.gauge']);
  });

  it('puts a scorecard range refusal on from or to', async () => {
    const badFrom = await call(t, DEMO.buyer, 'get', '/api/scorecards?from=2026-13-01');
    expect(badFrom.status).toBe(400);
    expect(fields(badFrom.body)).toEqual(['from']);
    const badBoth = await call(
      t,
      DEMO.buyer,
      'get',
      '/api/scorecards?from=2026-02-30&to=2026-02-31',
    );
    expect(fields(badBoth.body)).toEqual(['from', 'to']);
    const reversed = await call(
      t,
      DEMO.buyer,
      'get',
      '/api/scorecards?from=2026-06-01&to=2026-01-01',
    );
    expect(reversed.status).toBe(400);
    expect(reversed.body.errors).toEqual([
      { field: 'from', message: 'from must be on or before to' },
    ]);
    const audit = await call(t, DEMO.admin, 'get', '/api/audit?from=not-a-day');
    expect(audit.status).toBe(400);
    expect(fields(audit.body)).toEqual(['from']);
  });

  it('puts a rule’s refusal on the field it is about: a gauge, a taken code, a sort', async () => {
    const supplier = await makeSupplier(t, 'CTL-3');
    const gauge = await call(t, DEMO.qa, 'post', '/api/products', {
      ...spoolBody(supplier.id, 'CTL-G'),
      conductors: [{ purpose: 'power', gauge: '7 furlongs', claimedMaterial: 'copper' }],
    });
    expect(gauge.status).toBe(400);
    expect(fields(gauge.body)).toEqual(['conductors.0.gauge']);
    const taken = await call(t, DEMO.buyer, 'post', '/api/suppliers', {
      name: 'Another name',
      code: 'CTL-3',
    });
    expect(taken.status).toBe(409);
    expect(fields(taken.body)).toEqual(['code']);
    const sort = await call(t, DEMO.qa, 'get', '/api/products?sort=colour:asc');
    expect(sort.status).toBe(400);
    expect(fields(sort.body)).toEqual(['sort']);
  });

  it('keeps a refusal about no field with field null, and its status', async () => {
    const missing = await call(t, DEMO.buyer, 'get', '/api/corrective-actions/987654');
    expect(missing.status).toBe(404);
    expect(missing.body.errors).toEqual([{ field: null, message: missing.body.message }]);
    const link = await t.http.get('/api/supplier-portal/not-a-real-token');
    expect(link.status).toBe(404);
    expect(link.body.errors).toEqual([{ field: null, message: link.body.message }]);
  });
});
