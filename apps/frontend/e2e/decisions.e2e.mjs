import assert from 'node:assert/strict';
import { after, before, test } from 'node:test';
import { DEMO_PASSWORD, launchBrowser, screenshot, signIn, url } from './browser.mjs';

// An invented supplier and a 4 AWG copper spool of it; S-3 at AQL 15 on 50 spools is code
// letter B: 3 units, accept 1, reject 2 (ISO 2859-1 Tables I and II-A).
const STAMP = Date.now().toString(36).toUpperCase();
export const DECISIONS_PO = `PO-E2E-DEC-${STAMP}`;

/** Calls the API with a bearer token from one sign-in (the sign-in throttle counts each). */
async function apiAs(email) {
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

/** A lot awaiting decision: 3 spools cut, 2 far under their copper (a reject is due). */
async function lotAwaitingDecision() {
  const call = await apiAs('admin@demo.example');
  const supplier = await call('POST', '/suppliers', {
    name: `Copperline Test Wire ${STAMP}`,
    code: `CTW${STAMP}`.slice(0, 32),
    contactEmail: 'quality@copperline-test.example',
  });
  const product = await call('POST', '/products', {
    supplierId: supplier.id,
    sku: `CTW-4-${STAMP}`,
    kind: 'spool',
    description: '4 AWG power cable, red, 30 m spool',
    inspectionLevel: 'S-3',
    aql: '15',
    conductors: [{ purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper' }],
  });
  const instruments = await call('GET', '/instruments?pageSize=100');
  const balance = instruments.items.find(
    (i) => i.kind === 'balance' && i.active && i.calibrationStatus !== 'overdue',
  );
  assert.ok(balance, 'the demo register holds a balance in calibration');
  const lot = await call('POST', '/lots', {
    productId: product.id,
    poNumber: DECISIONS_PO,
    quantity: 50,
    unit: 'spools',
  });
  assert.equal(lot.samplingPlan.sampleSize, 3);
  // 195 g over 1000 mm of copper is about 21.5 mm² (a good 4 AWG, nominal 21.15 mm²);
  // 76.1 g is about 8.4 mm², which measures as 8 AWG (A = m / (ρ L (1 + k)), ρ 8.89 g/cm³).
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
  const detail = await call('GET', `/lots/${lot.id}`);
  assert.equal(detail.status, 'awaiting_decision');
  assert.equal(detail.evaluation.recommendation, 'reject');
  return detail;
}

let browser;
let page;
before(async () => {
  browser = await launchBrowser();
  page = await browser.context.newPage();
});
after(async () => {
  await browser?.close();
});

test('a QA lead rejects a lot with a reason, sees the NCR number and prints the tag', async () => {
  const lot = await lotAwaitingDecision();

  await page.goto(url(`/sign-in?redirectTo=${encodeURIComponent(`/lots/${lot.id}`)}`));
  await signIn(page, 'qa@demo.example');
  await page.waitForURL((u) => u.pathname === `/lots/${lot.id}`);
  const panel = page.locator('[aria-label="Decision panel"]');
  await panel.getByText('Recommendation:').waitFor();
  assert.ok(await panel.getByRole('radio', { name: 'Reject (recommended)' }).isChecked());
  await page.getByRole('heading', { name: 'Timeline' }).waitFor();
  await page.locator('[aria-label="Lot events"] li').first().waitFor();

  // A concession needs 20 characters of reason; the counter says how far along it is.
  await panel.getByRole('radio', { name: 'Accept on concession' }).check();
  const reason = panel.getByLabel(/Reason \(required\)/);
  await reason.fill('Short');
  await panel
    .getByText('A concession needs a reason of at least 20 characters (5 so far).')
    .waitFor();
  await screenshot(page, 'decision-reason-required');

  await panel.getByRole('radio', { name: 'Reject (recommended)' }).check();
  await panel
    .getByLabel(/Reason \(optional\)/)
    .fill('Units 1 and 2 measure as 8 AWG on a 4 AWG label: well short of the copper promised.');
  await panel.getByRole('button', { name: 'Record the decision' }).click();
  const ncr = panel.getByText(/Nonconformance record NCR-\d{4}-\d{4} is open/);
  await ncr.waitFor();
  const ncrNumber = (await ncr.textContent()).match(/NCR-\d{4}-\d{4}/)[0];
  await panel.locator('[aria-label="Switching notice"]').waitFor();
  // The history shows the reject with its NCR, once the lot has been read again.
  await panel.locator('section[aria-label="Decisions"]').getByText(ncrNumber).waitFor();
  await page.evaluate(() => globalThis.scrollTo(0, 0));
  await screenshot(page, 'decision-rejected');

  // The tag opens in a new tab; it is a PDF.
  const [tab] = await Promise.all([
    page.context().waitForEvent('page'),
    page.getByRole('link', { name: 'Print tag' }).click(),
  ]);
  assert.match(tab.url(), new RegExp(`/api/lots/${lot.id}/tag\\.pdf$`));
  await tab.close();
  const tag = await page.request.get(url(`/api/lots/${lot.id}/tag.pdf`));
  assert.equal(tag.status(), 200);
  assert.match(tag.headers()['content-type'], /^application\/pdf/);
  assert.equal((await tag.body()).subarray(0, 5).toString('latin1'), '%PDF-');

  // The decision is on the timeline.
  await page
    .locator('[aria-label="Lot events"]')
    .getByText(/reject/i)
    .first()
    .waitFor();
});
