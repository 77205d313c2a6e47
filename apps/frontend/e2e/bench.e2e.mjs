import assert from 'node:assert/strict';
import { after, before, test } from 'node:test';
import { apiAs } from './api-fixtures.mjs';
import { launchBrowser, screenshot, signIn, url } from './browser.mjs';

// Bench mode on a phone (issue 15): a mass sample in at most three touches plus its digits.
// A touch is a tap on the screen or a key of the on-screen keyboard other than the digits
// and the decimal mark (Enter counts): counted in the page by an init script.

const PHONE = { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true };
const STAMP = Date.now().toString(36).toUpperCase();

const COUNT_TOUCHES = () => {
  globalThis.__touches = 0;
  globalThis.__keys = [];
  globalThis.addEventListener('touchstart', () => (globalThis.__touches += 1), true);
  globalThis.addEventListener(
    'keydown',
    (e) => {
      if (!/^[0-9.,]$/.test(e.key)) globalThis.__keys.push(e.key);
    },
    true,
  );
};

/** Touches since the last call, and the non-digit keys among them. */
async function takeTouches(page) {
  return page.evaluate(() => {
    const result = { taps: globalThis.__touches, keys: [...globalThis.__keys] };
    globalThis.__touches = 0;
    globalThis.__keys = [];
    return { ...result, total: result.taps + result.keys.length };
  });
}

let browser;
let page;
let lot;
let serialLot;
let offlineLot;
let handoverLot;
let admin;
before(async () => {
  // S-3 at AQL 4.0 on 50 spools is code letter B: 3 units, accept 0, reject 1
  // (MIL-STD-105E / ANSI/ASQ Z1.4 Tables I and II-A).
  admin = await apiAs('admin@demo.example');
  const supplier = await admin('POST', '/suppliers', {
    name: `Bench Test Wire ${STAMP}`,
    code: `BTW-${STAMP}`.slice(0, 32),
    contactEmail: 'quality@bench-test.example',
  });
  const product = await admin('POST', '/products', {
    supplierId: supplier.id,
    sku: `BT-4AWG-${STAMP}`,
    kind: 'spool',
    description: '4 AWG power cable, 30 m spool',
    inspectionLevel: 'S-3',
    aql: '4.0',
    conductors: [{ purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper' }],
  });
  lot = await admin('POST', '/lots', {
    productId: product.id,
    poNumber: `PO-BENCH-${STAMP}`,
    quantity: 50,
    unit: 'spools',
  });
  assert.equal(lot.samplingPlan.sampleSize, 3);
  serialLot = await admin('POST', '/lots', {
    productId: product.id,
    poNumber: `PO-SERIAL-${STAMP}`,
    quantity: 50,
    unit: 'spools',
  });
  offlineLot = await admin('POST', '/lots', {
    productId: product.id,
    poNumber: `PO-OFFLINE-${STAMP}`,
    quantity: 50,
    unit: 'spools',
  });
  handoverLot = await admin('POST', '/lots', {
    productId: product.id,
    poNumber: `PO-HANDOVER-${STAMP}`,
    quantity: 50,
    unit: 'spools',
  });
  browser = await launchBrowser(PHONE);
  page = await browser.context.newPage();
  await page.addInitScript(COUNT_TOUCHES);
});
after(async () => {
  await browser?.close();
});

test('a clerk records a full small plan in bench mode on a phone, in three touches a sample', async () => {
  await signIn(page, 'clerk@demo.example');
  await page.waitForURL((u) => u.pathname === '/today');
  await page.goto(url(`/lots/${lot.id}/bench`));
  await page.getByRole('heading', { name: 'Unit 1' }).waitFor();
  await assert.doesNotReject(page.getByTestId('hold-banner').waitFor());

  const mass = page.getByRole('textbox', { name: 'Mass of the strands' });
  assert.equal(await mass.getAttribute('inputmode'), 'decimal', 'the phone shows its number pad');
  await screenshot(page, 'bench-phone-first-piece');

  // First piece on a new device: the balance and the cut length are chosen once.
  await takeTouches(page);
  await page.getByRole('combobox', { name: 'Balance' }).tap();
  await page.getByRole('option').filter({ hasNotText: 'overdue' }).first().tap();
  await page.getByRole('textbox', { name: 'Cut length' }).tap();
  await page.keyboard.type('1000');
  const setup = await takeTouches(page);

  // 195 g over 1000 mm of copper is about 21.5 mm², a good 4 AWG (nominal 21.15 mm²);
  // 76.1 g is about 8.4 mm², which measures as 8 AWG (A = m / (ρ L (1 + k)), ρ 8.89 g/cm³).
  const pieces = [
    { unit: 1, massG: '195', verdict: 'Conforms' },
    { unit: 2, massG: '76.1', verdict: 'Nonconforming' },
    { unit: 3, massG: '194.2', verdict: 'Conforms' },
  ];
  const counts = [];
  for (const piece of pieces) {
    await page.getByRole('heading', { name: `Unit ${piece.unit}` }).waitFor();
    await mass.tap();
    await page.keyboard.type(piece.massG);
    await page.keyboard.press('Enter');
    const verdict = page.getByRole('status', { name: `Unit ${piece.unit}: ${piece.verdict}` });
    await verdict.waitFor();
    if (piece.unit === 1) await screenshot(page, 'bench-phone-verdict');
    const next = page.getByRole('button', { name: /^Next: / });
    if (piece.unit < pieces.length) await next.tap();
    const touches = await takeTouches(page);
    counts.push(touches.total);
    assert.ok(
      touches.total <= 3,
      `unit ${piece.unit}: ${touches.total} touches (${touches.taps} taps, keys ${touches.keys.join(' ')}) plus the digits`,
    );
  }
  assert.ok(setup.total <= 3, `setting the bench up once took ${setup.total} touches`);
  await page.getByText('Every planned piece has a reading').waitFor();
  await page.getByText('3 of 3 pieces recorded').waitFor();
  await screenshot(page, 'bench-phone-done');

  // Exactly one sample and one reading per piece reached the server, with the balance.
  const stored = await admin('GET', `/lots/${lot.id}`);
  assert.deepEqual(stored.samples.map((s) => [s.seq, s.readings.length, s.verdict]).sort(), [
    [1, 1, 'conforms'],
    [2, 1, 'nonconforming'],
    [3, 1, 'conforms'],
  ]);
  assert.ok(
    stored.samples.every((s) => s.readings[0].instruments.some((i) => i.kind === 'balance')),
  );
  assert.equal(stored.status, 'awaiting_decision');
  // Still held until a QA lead decides.
  await page.reload();
  await page.getByTestId('hold-banner').waitFor();
  console.log(`touches per mass sample: ${counts.join(', ')} (set-up once: ${setup.total})`);
});

test('bench mode on a laptop screen, and the instruments stay remembered on this device', async () => {
  await page.setViewportSize({ width: 1366, height: 768 });
  await page.goto(url(`/lots/${lot.id}/bench`));
  await page.getByRole('combobox', { name: 'Piece' }).waitFor();
  await page.getByRole('button', { name: /Another reading|Next/ }).count();
  await screenshot(page, 'bench-laptop');
  const balance = page.getByRole('combobox', { name: 'Balance' });
  assert.notEqual((await balance.textContent()).trim(), '', 'the balance is remembered');
});

// A fake serial port in the page: Web Serial's getPorts/requestPort/open/readable, fed by
// the test with lines as a balance sends them.
const FAKE_SERIAL = () => {
  const port = {
    readable: null,
    async open() {
      this.readable = new ReadableStream({
        start(controller) {
          globalThis.__balanceSends = (text) => controller.enqueue(new TextEncoder().encode(text));
        },
      });
    },
    async close() {},
    getInfo: () => ({}),
  };
  Object.defineProperty(globalThis.navigator, 'serial', {
    configurable: true,
    value: { getPorts: async () => [], requestPort: async () => port },
  });
};

test('a balance on a (fake) serial port fills the mass once it settles', async () => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.addInitScript(FAKE_SERIAL);
  await page.goto(url(`/lots/${serialLot.id}/bench`));
  await page.getByRole('heading', { name: 'Unit 1' }).waitFor();
  await page.getByRole('button', { name: 'Read the balance' }).tap();
  const status = page.getByRole('status', { name: 'Balance' });
  await status.getByText('waiting for a weight').waitFor();
  const send = (text) => page.evaluate((t) => globalThis.__balanceSends(t), text);
  const mass = page.getByRole('textbox', { name: 'Mass of the strands' });

  await send('QT,GS,+00012 PC\r\n');
  await status.getByText('«QT,GS,+00012 PC»').waitFor();
  await send('US,GS,+00190.12  g\r\nUS,GS,+00194.80  g\r');
  await status.getByText('194.80 g — settling').waitFor();
  assert.equal(await mass.inputValue(), '', 'an unsettled weight is not taken');
  await send('\nST,GS,+00195.04  g\r\n');
  await status.getByText('filled in 195.04 g').waitFor();
  assert.equal(await mass.inputValue(), '195.04');
  await screenshot(page, 'bench-phone-serial-balance');
  await mass.press('Enter');
  await page.getByRole('status', { name: 'Unit 1: Conforms' }).waitFor();

  const stored = await admin('GET', `/lots/${serialLot.id}`);
  const [reading] = stored.samples[0].readings;
  assert.equal(reading.inputs.massG, 195.04);
  assert.ok(
    reading.instruments.some((i) => i.kind === 'balance'),
    'the balance is kept',
  );
});

test('readings taken offline are kept, survive a reload, and arrive exactly once', async () => {
  await page.setViewportSize({ width: 390, height: 844 });
  const bench = url(`/lots/${offlineLot.id}/bench`);
  await page.goto(bench);
  await page.getByRole('heading', { name: 'Unit 1' }).waitFor();
  // Bench mode installs the service worker; once it controls the page, a reload fills its
  // cache of the session, the lot and the instruments.
  await page.waitForFunction(() => navigator.serviceWorker?.controller != null, null, {
    timeout: 60_000,
  });
  await page.reload();
  await page.getByRole('heading', { name: 'Unit 1' }).waitFor();

  await browser.context.setOffline(true);
  const mass = page.getByRole('textbox', { name: 'Mass of the strands' });
  for (const [unit, massG] of [
    [1, '195'],
    [2, '194.6'],
  ]) {
    await page.getByRole('heading', { name: `Unit ${unit}` }).waitFor();
    await mass.tap();
    await page.keyboard.type(massG);
    await page.keyboard.press('Enter');
    await page.getByRole('status', { name: `Unit ${unit}: waiting to send` }).waitFor();
    if (unit === 1) await page.getByRole('button', { name: /^Next: Unit 2/ }).tap();
  }
  await page.getByText('2 readings waiting to send').waitFor();
  // Kept on the device is not recorded: the progress says so.
  await page.getByText('0 of 3 pieces recorded · 2 waiting to send').waitFor();
  await screenshot(page, 'bench-phone-offline');

  // The page reloads without the network, and the readings are still there.
  await page.reload();
  await page.getByText('2 readings waiting to send').waitFor();
  await page.getByText('0 of 3 pieces recorded · 2 waiting to send').waitFor();
  await page.getByRole('heading', { name: 'Unit 3' }).waitFor();
  let stored = await admin('GET', `/lots/${offlineLot.id}`);
  assert.equal(stored.samples.length, 0, 'nothing reached the server while offline');

  await browser.context.setOffline(false);
  await page.getByText(/readings? waiting to send/).waitFor({ state: 'detached', timeout: 30_000 });
  await page.getByText('2 of 3 pieces recorded').waitFor();
  stored = await admin('GET', `/lots/${offlineLot.id}`);
  assert.deepEqual(
    stored.samples.map((s) => [s.seq, s.readings.length, s.readings[0].inputs.massG]).sort(),
    [
      [1, 1, 195],
      [2, 1, 194.6],
    ],
  );
  // Sent again (a lost answer, a second tab): still once.
  await page.evaluate(() => globalThis.dispatchEvent(new Event('online')));
  await page.waitForTimeout(1000);
  stored = await admin('GET', `/lots/${offlineLot.id}`);
  assert.equal(stored.samples.flatMap((s) => s.readings).length, 2);
});

test('a clerk voids their own slip on the Lot page, not another’s reading, and the Void fits 1366 px', async () => {
  // The admin takes unit 2 of the serial lot; the clerk took unit 1 above.
  const instruments = await admin('GET', '/instruments?pageSize=100');
  const balance = instruments.items.find(
    (i) => i.kind === 'balance' && i.active && i.calibrationStatus !== 'overdue',
  );
  const sample = await admin('POST', `/lots/${serialLot.id}/samples`, {
    conductorId: (await admin('GET', `/lots/${serialLot.id}`)).product.conductors[0].id,
    seq: 2,
  });
  await admin('POST', `/samples/${sample.id}/readings`, {
    method: 'mass',
    massG: 195,
    lengthMm: 1000,
    instrumentIds: [balance.id],
  });

  await page.setViewportSize({ width: 1366, height: 768 });
  await page.goto(url(`/lots/${serialLot.id}`));
  const voids = page.getByRole('button', { name: 'Void', exact: true });
  await page.getByRole('cell', { name: /^Unit 2 .*Conforms/ }).click();
  await page.getByRole('heading', { name: 'Unit 2', exact: true }).waitFor();
  assert.equal(await voids.count(), 0, 'no Void on a reading someone else took');
  await page.getByRole('cell', { name: /^Unit 1 .*Conforms/ }).click();
  await page.getByRole('heading', { name: 'Unit 1', exact: true }).waitFor();
  await voids.first().waitFor();
  const box = await voids.first().boundingBox();
  assert.ok(box.x + box.width <= 1366, `the Void button ends at ${box.x + box.width} px`);
  await screenshot(page, 'lot-clerk-void-1366');
  await voids.first().click();
  await page.getByLabel('Reason').fill('mass typed from the wrong piece');
  await page.getByRole('button', { name: 'Void reading' }).click();
  await page.getByText('Void: mass typed from the wrong piece').waitFor();
  const stored = await admin('GET', `/lots/${serialLot.id}`);
  const one = stored.samples.find((s) => s.seq === 1).readings[0];
  assert.equal(one.voided, true);
  assert.equal(stored.samples.find((s) => s.seq === 2).readings[0].voided, false);
});

test('a reading kept offline waits for the one who took it, never sent under another name', async () => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(url(`/lots/${handoverLot.id}/bench`));
  await page.getByRole('heading', { name: 'Unit 1' }).waitFor();
  await page.waitForFunction(() => navigator.serviceWorker?.controller != null, null, {
    timeout: 60_000,
  });
  // The clerk weighs unit 1 with the network down.
  await browser.context.setOffline(true);
  const mass = page.getByRole('textbox', { name: 'Mass of the strands' });
  await mass.tap();
  await page.keyboard.type('195');
  await page.keyboard.press('Enter');
  await page.getByRole('status', { name: 'Unit 1: waiting to send' }).waitFor();
  await page.getByText('1 reading waiting to send').waitFor();
  // The clerk walks away; their session ends; the network comes back with nobody signed in.
  await page.close();
  await browser.context.clearCookies();
  await browser.context.setOffline(false);

  // The QA lead signs in on the same phone and opens the same lot.
  page = await browser.context.newPage();
  await signIn(page, 'qa@demo.example');
  await page.waitForURL((u) => u.pathname !== '/sign-in');
  await page.goto(url(`/lots/${handoverLot.id}/bench`));
  const held = page.getByRole('alert', { name: 'Waiting for their recorder' });
  await held.getByText('1 reading taken by Rosa Okafor waits for their recorder').waitFor();
  await held.getByText('Not sent under your name').waitFor();
  await page.getByText('0 of 3 pieces recorded · 1 waiting to send').waitFor();
  assert.equal(await page.getByRole('alert', { name: 'Waiting to send' }).count(), 0);
  await screenshot(page, 'bench-phone-held-for-recorder');
  // The network is back and the page retries: still nothing under the QA lead's name.
  await page.evaluate(() => globalThis.dispatchEvent(new Event('online')));
  await page.waitForTimeout(2000);
  let stored = await admin('GET', `/lots/${handoverLot.id}`);
  assert.equal(stored.samples.length, 0, 'nothing sent while the QA lead is signed in');

  // The QA lead signs out; the clerk signs in: told, and the reading goes under their name.
  await page.locator('header button[aria-haspopup="menu"]').click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.waitForURL((u) => u.pathname === '/sign-in');
  await page.goto(url('/sign-in')); // a fresh sign-in: the clerk's home, not the QA lead's page
  await signIn(page, 'clerk@demo.example');
  await page.waitForURL((u) => u.pathname === '/today');
  await page.getByText('1 reading you took while offline was sent.').waitFor({ timeout: 30_000 });
  stored = await admin('GET', `/lots/${handoverLot.id}`);
  assert.deepEqual(
    stored.samples.flatMap((s) => s.readings.map((r) => [s.seq, r.inputs.massG, r.takenBy.name])),
    [[1, 195, 'Rosa Okafor']],
  );
  await page.goto(url(`/lots/${handoverLot.id}/bench`));
  await page.getByText('1 of 3 pieces recorded').waitFor();
  assert.equal(await page.getByRole('alert', { name: 'Waiting for their recorder' }).count(), 0);
});
