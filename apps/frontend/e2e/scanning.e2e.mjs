import assert from 'node:assert/strict';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { apiAs } from './api-fixtures.mjs';
import { launchBrowser, screenshot, signIn, url, BASE_URL } from './browser.mjs';
import { blankFrame, fakeCameraArgs, qrFrame, symbolFrame, writeY4m } from './fake-camera.mjs';

// Scanning (issue 15): the camera is a y4m file Chromium plays in a loop. Debian's
// Chromium has no BarcodeDetector of its own, so these runs read through the polyfill
// and its ZXing WebAssembly, which must come from our own origin.

const PHONE = { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true };
const DESK = { viewport: { width: 1366, height: 768 } };
const STAMP = Date.now().toString(36).toUpperCase();
const ORIGIN = new URL(BASE_URL).origin;

let dir;
let admin;
before(async () => {
  dir = await mkdtemp(join(tmpdir(), 'gaugeproof-camera-'));
  admin = await apiAs('admin@demo.example');
});
after(async () => {
  await rm(dir, { recursive: true, force: true });
});

/**
 * A browser whose camera shows nothing for about two seconds, then `text` as a QR code;
 * every request it makes is listed (to show none leaves our origin).
 */
async function browserFilming(name, text, options, code = qrFrame(text)) {
  const file = join(dir, `${name}.y4m`);
  // 5 frames a second: 10 blank (the dialog can be seen looking), then 5 with the code.
  const blank = blankFrame();
  await writeY4m(file, [...Array(10).fill(blank), ...Array(5).fill(code)]);
  const browser = await launchBrowser({ ...options, args: fakeCameraArgs(file) });
  await browser.context.grantPermissions(['camera'], { origin: ORIGIN });
  const requests = [];
  browser.context.on('request', (request) => requests.push(request.url()));
  const page = await browser.context.newPage();
  return { browser, page, requests };
}

function assertOwnOrigin(requests) {
  const wasm = requests.filter((u) => u.endsWith('.wasm'));
  assert.equal(wasm.length, 1, `the reader's WebAssembly was fetched once: ${wasm.join(', ')}`);
  assert.equal(new URL(wasm[0]).origin, ORIGIN, 'from our own origin');
  const elsewhere = requests.filter(
    (u) => !u.startsWith('data:') && !u.startsWith('blob:') && new URL(u).origin !== ORIGIN,
  );
  assert.deepEqual(elsewhere, [], 'nothing is fetched from another origin');
}

test('on a phone, the camera reads a supplier lot label into the receiving form; typing stays', async () => {
  const label = `SL-DRUM-${STAMP}`;
  const { browser, page, requests } = await browserFilming('label', label, PHONE);
  try {
    await signIn(page, 'clerk@demo.example');
    await page.waitForURL((u) => u.pathname === '/today');
    await page.goto(url('/receiving'));
    const firstScreen = requests.filter((u) => /ponyfill|scan-dialog|\.wasm/.test(u));
    assert.deepEqual(firstScreen, [], 'the scanner loads only when a scan starts');

    const po = page.getByRole('textbox', { name: 'PO number' });
    await po.tap();
    await page.keyboard.type(`PO-TYPED-${STAMP}`);

    await page.getByRole('button', { name: 'Scan the supplier lot label' }).tap();
    const dialog = page.getByRole('dialog', { name: 'Scan the supplier lot label' });
    await dialog.getByText('Hold the code inside the frame').waitFor();
    await screenshot(page, 'scanner-phone');
    await dialog.waitFor({ state: 'detached', timeout: 20_000 });

    assert.equal(
      await page.getByRole('textbox', { name: 'Supplier lot code' }).inputValue(),
      label,
    );
    assert.equal(await po.inputValue(), `PO-TYPED-${STAMP}`, 'the typed PO is kept');
    await page.getByText('Supplier lot code read from the QR code').waitFor();
    await screenshot(page, 'scanner-phone-filled');
    assertOwnOrigin(requests);
  } finally {
    await browser.close();
  }
});

test('at a desk, scanning a held lot tag opens the lot in bench mode', async () => {
  const supplier = await admin('POST', '/suppliers', {
    name: `Scan Test Wire ${STAMP}`,
    code: `STW-${STAMP}`.slice(0, 32),
    contactEmail: 'quality@scan-test.example',
  });
  const product = await admin('POST', '/products', {
    supplierId: supplier.id,
    sku: `ST-4AWG-${STAMP}`,
    kind: 'spool',
    description: '4 AWG ground cable, 30 m spool',
    conductors: [{ purpose: 'ground', gauge: '4 AWG', claimedMaterial: 'copper' }],
  });
  const lot = await admin('POST', '/lots', {
    productId: product.id,
    poNumber: `PO-SCAN-${STAMP}`,
    quantity: 2,
    unit: 'spools',
  });
  // The tag's QR code as the server prints it for a held lot (documents.service.ts).
  const { browser, page, requests } = await browserFilming(
    'tag',
    `${ORIGIN}/lots/${lot.id}/bench`,
    DESK,
  );
  try {
    await signIn(page, 'clerk@demo.example');
    await page.waitForURL((u) => u.pathname === '/today');
    await page.getByRole('button', { name: 'Scan a lot tag' }).click();
    const dialog = page.getByRole('dialog', { name: 'Scan a lot tag' });
    await dialog.getByText('Hold the code inside the frame').waitFor();
    await screenshot(page, 'scanner-desk');
    await page.waitForURL((u) => u.pathname === `/lots/${lot.id}/bench`, { timeout: 20_000 });
    await page.getByRole('heading', { name: `Lot ${lot.id} · bench` }).waitFor();
    await page.getByTestId('hold-banner').waitFor();
    assertOwnOrigin(requests);
  } finally {
    await browser.close();
  }
});

// The other symbologies the dock reads, each filmed on its own (ZXing's writer draws them):
// a packing slip's Code 128, a supplier label's Data Matrix and EAN-13, a PO's EAN-8
// (GS1 check digits: 4006381333931 and 96385074 are valid).
const SYMBOLS = [
  {
    format: 'Code128',
    text: `PS-${STAMP}`.slice(0, 12),
    button: 'Scan the packing slip',
    field: 'Packing-slip number',
    label: 'Code 128',
  },
  {
    format: 'DataMatrix',
    text: `SL-DM-${STAMP}`,
    button: 'Scan the supplier lot label',
    field: 'Supplier lot code',
    label: 'Data Matrix',
  },
  {
    format: 'EAN13',
    text: '4006381333931',
    button: 'Scan the supplier lot label',
    field: 'Supplier lot code',
    label: 'EAN-13',
  },
  {
    format: 'EAN8',
    text: '96385074',
    button: 'Scan the PO number',
    field: 'PO number',
    label: 'EAN-8',
  },
];

for (const symbol of SYMBOLS) {
  test(`on a phone, the camera reads ${symbol.label} into “${symbol.field}”`, async () => {
    const { browser, page, requests } = await browserFilming(
      symbol.format,
      symbol.text,
      PHONE,
      await symbolFrame(symbol.format, symbol.text),
    );
    try {
      await signIn(page, 'clerk@demo.example');
      await page.waitForURL((u) => u.pathname === '/today');
      await page.goto(url('/receiving'));
      await page.getByRole('button', { name: symbol.button }).tap();
      const dialog = page.getByRole('dialog', { name: symbol.button });
      await dialog.getByText('Hold the code inside the frame').waitFor();
      await dialog.waitFor({ state: 'detached', timeout: 20_000 });
      assert.equal(
        await page.getByRole('textbox', { name: symbol.field }).inputValue(),
        symbol.text,
      );
      await page.getByText(`${symbol.field} read from the ${symbol.label}`).waitFor();
      if (symbol.format === 'Code128') await screenshot(page, 'scanner-phone-code128');
      assertOwnOrigin(requests);
    } finally {
      await browser.close();
    }
  });
}
