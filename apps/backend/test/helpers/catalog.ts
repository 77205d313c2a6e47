import { expect } from 'vitest';
import { call } from './api';
import { DEMO, type TestApp } from './test-app';

/** Creates a supplier through the API (as purchasing) and returns its body. */
export async function makeSupplier(t: TestApp, code: string, extra: object = {}) {
  const res = await call(t, DEMO.buyer, 'post', '/api/suppliers', {
    name: `Test Supplier ${code}`,
    code,
    contactEmail: `quality@${code.toLowerCase()}.example`,
    ...extra,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; name: string; code: string; status: string; version: number };
}

export const spoolBody = (supplierId: number, sku: string, extra: object = {}) => ({
  supplierId,
  sku,
  kind: 'spool',
  description: `4 AWG power cable ${sku}`,
  lengthPerUnitM: 50,
  conductors: [{ purpose: 'power', gauge: '4', claimedMaterial: 'copper', claimedStrands: 380 }],
  ...extra,
});

/** Creates a product through the API (as the QA lead) and returns its body. */
export async function makeProduct(t: TestApp, body: object) {
  const res = await call(t, DEMO.qa, 'post', '/api/products', body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; sku: string; version: number; conductors: { id: number }[] };
}
