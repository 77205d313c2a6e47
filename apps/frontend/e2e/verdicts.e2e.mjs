import assert from 'node:assert/strict';
import { after, before, test } from 'node:test';
import { apiAs } from './api-fixtures.mjs';
import { launchBrowser, screenshot, signInToLot } from './browser.mjs';

// Issue 13 in the browser: a stranded conductor offers no diameter tab, a typing slip is
// questioned before anything is saved, and a lot whose nonconforming units reach the
// reject number can be rejected at once. Invented supplier and product.
const STAMP = Date.now().toString(36).toUpperCase();

let browser;
let page;
let admin;
let lot;
let balance;
before(async () => {
  admin = await apiAs('admin@demo.example');
  const supplier = await admin('POST', '/suppliers', {
    name: `Verdict Test Wire ${STAMP}`,
    code: `VTW-${STAMP}`.slice(0, 32),
    contactEmail: 'quality@verdict-test.example',
  });
  // S-3 at AQL 10 on 50 spools: code letter B arrowed to 5 units, accept 1, reject 2
  // (MIL-STD-105E / ANSI/ASQ Z1.4 Tables I and II-A).
  const product = await admin('POST', '/products', {
    supplierId: supplier.id,
    sku: `VT-4-${STAMP}`,
    kind: 'spool',
    description: '4 AWG power cable, 380 strands, 30 m spool',
    inspectionLevel: 'S-3',
    aql: '10',
    conductors: [
      { purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper', claimedStrands: 380 },
    ],
  });
  lot = await admin('POST', '/lots', {
    productId: product.id,
    poNumber: `PO-VERDICT-${STAMP}`,
    quantity: 50,
    unit: 'spools',
  });
  assert.equal(lot.samplingPlan.sampleSize, 5);
  const instruments = await admin('GET', '/instruments?pageSize=100');
  balance = instruments.items.find(
    (i) => i.kind === 'balance' && i.active && i.calibrationStatus !== 'overdue',
  );
  assert.ok(balance, 'the demo register holds a balance in calibration');
  await admin('POST', `/lots/${lot.id}/samples`, {
    conductorId: product.conductors[0].id,
    seq: 1,
  });
  lot.conductorId = product.conductors[0].id;
  browser = await launchBrowser();
  page = await browser.context.newPage();
});
after(async () => {
  await browser?.close();
});

test('a stranded conductor offers no diameter tab, and a typing slip is questioned', async () => {
  await signInToLot(page, 'clerk@demo.example', lot.id);
  const tabs = page.getByRole('tablist', { name: 'Reading method' });
  await tabs.waitFor();
  const names = await tabs.getByRole('tab').allTextContents();
  assert.deepEqual(names, ['Mass', 'Strands', 'Resistance'], 'no diameter tab for 380 strands');

  // 1950 g for a metre of 4 AWG is ten times its copper (about 192 g: 21.15 mm² × 8.89 g/cm³
  // × 1.02, ASTM B258, IACS, ASTM B496): the server asks before saving anything.
  const form = page.getByRole('form', { name: 'Mass reading' });
  await form.getByRole('textbox', { name: 'Mass of the strands' }).fill('1950');
  await form.getByRole('textbox', { name: 'Cut length' }).fill('1000');
  await form.getByRole('combobox', { name: 'Balance' }).click();
  await page.getByRole('option', { name: new RegExp(balance.serial) }).click();
  await form.getByRole('button', { name: 'Record mass reading' }).click();
  const question = page.getByRole('alert', { name: 'Unusual reading' });
  await question.getByText(/about ten times the nominal mass: a decimal point\?/).waitFor();
  await screenshot(page, 'verdicts-typing-slip-questioned');
  const stored = await admin('GET', `/lots/${lot.id}`);
  assert.deepEqual(
    stored.samples.map((s) => s.readings.length),
    [0],
    'nothing was saved while the reading is questioned',
  );

  // The clerk corrects it: 76.1 g is 8.39 mm², nonconforming, measures as 8 AWG (issue 3).
  await form.getByRole('textbox', { name: 'Mass of the strands' }).fill('76.1');
  await form.getByRole('button', { name: 'Record mass reading' }).click();
  await page.getByText('Treat as 8 AWG for fusing and voltage drop', { exact: false }).waitFor();
  await page.getByRole('button', { name: 'Budget' }).first().click();
  await page.getByRole('table', { name: /Uncertainty budget of reading/ }).waitFor();
  await screenshot(page, 'verdicts-lot-page-budget');
});

test('a lot whose nonconforming units reach Re is rejected at once', async () => {
  // Unit 2 also short: 2 nonconforming reach Re 2 with 3 of 5 units still uncut.
  const sample = await admin('POST', `/lots/${lot.id}/samples`, {
    conductorId: lot.conductorId,
    seq: 2,
  });
  await admin('POST', `/samples/${sample.id}/readings`, {
    method: 'mass',
    massG: 76.1,
    lengthMm: 1000,
    instrumentIds: [balance.id],
  });
  const detail = await admin('GET', `/lots/${lot.id}`);
  assert.equal(detail.status, 'awaiting_decision');
  assert.equal(detail.evaluation.recommendation, 'reject');
  assert.equal(detail.evaluation.samplesTested, 2);

  await browser.context.clearCookies();
  await signInToLot(page, 'qa@demo.example', lot.id);
  const panel = page.locator('[aria-label="Decision panel"]');
  await page.getByRole('button', { name: 'Go to the decision' }).click();
  await panel.getByText('Recommendation:').waitFor();
  assert.ok(await panel.getByRole('radio', { name: 'Reject (recommended)' }).isChecked());
  await panel.getByRole('button', { name: 'Record the decision' }).click();
  await panel.getByText(/Nonconformance record NCR-\d{4}-\d{4} is open/).waitFor();
  await screenshot(page, 'verdicts-early-reject');
  const after = await admin('GET', `/lots/${lot.id}`);
  assert.equal(after.status, 'rejected');
});
