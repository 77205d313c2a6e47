// API set-up shared by the browser tests: what a test needs on the server before the
// browser opens, made through the same API the screens use.
import assert from 'node:assert/strict';
import { DEMO_PASSWORD, url } from './browser.mjs';

/** Calls the API with a bearer token from one sign-in (the sign-in throttle counts each). */
export async function apiAs(email) {
  const login = await fetch(url('/api/auth/login'), {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  assert.equal(login.status, 200, `${email} signs in through the API`);
  const { accessToken } = await login.json();
  return async (method, path, body) => {
    const response = await fetch(url(`/api${path}`), {
      method,
      headers: { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const data = await response.json();
    assert.ok(response.ok, `${method} ${path} → ${response.status} ${JSON.stringify(data)}`);
    return data;
  };
}

/**
 * An invented supplier, a 4 AWG copper spool of it and a lot of 50 spools awaiting its
 * decision with two of its first three units far under their copper (a reject is due at
 * once: curtailed rejection). S-3 at AQL 10 on 50 spools is code letter B, arrowed to
 * 5 units, accept 1, reject 2 (MIL-STD-105E / ANSI/ASQ Z1.4 Tables I and II-A). 195 g over 1000 mm of copper is about 21.5 mm² (a good 4 AWG, nominal
 * 21.15 mm²); 76.1 g is about 8.4 mm², which measures as 8 AWG (A = m / (ρ L (1 + k)),
 * ρ 8.89 g/cm³).
 */
export async function lotAwaitingReject(call, { supplier, code, sku, purpose, poNumber }) {
  const made = await call('POST', '/suppliers', {
    name: supplier,
    code: code.slice(0, 32),
    contactEmail: 'quality@copperline-test.example',
  });
  const product = await call('POST', '/products', {
    supplierId: made.id,
    sku,
    kind: 'spool',
    description: `4 AWG ${purpose} cable, 30 m spool`,
    inspectionLevel: 'S-3',
    aql: '10',
    conductors: [{ purpose, gauge: '4 AWG', claimedMaterial: 'copper' }],
  });
  const instruments = await call('GET', '/instruments?pageSize=100');
  const balance = instruments.items.find(
    (i) => i.kind === 'balance' && i.active && i.calibrationStatus !== 'overdue',
  );
  assert.ok(balance, 'the demo register holds a balance in calibration');
  const lot = await call('POST', '/lots', {
    productId: product.id,
    poNumber,
    quantity: 50,
    unit: 'spools',
  });
  assert.equal(lot.samplingPlan.sampleSize, 5);
  for (const [seq, massG] of [
    [1, 76.1],
    [2, 76.1],
    [3, 195],
  ]) {
    const sample = await call('POST', `/lots/${lot.id}/samples`, {
      conductorId: product.conductors[0].id,
      seq,
    });
    await call('POST', `/samples/${sample.id}/readings`, {
      method: 'mass',
      massG,
      lengthMm: 1000,
      instrumentIds: [balance.id],
    });
  }
  return call('GET', `/lots/${lot.id}`);
}
