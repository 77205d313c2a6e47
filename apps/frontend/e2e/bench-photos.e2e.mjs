import assert from 'node:assert/strict';
import { before, test } from 'node:test';
import { apiAs } from './api-fixtures.mjs';
import { DEMO_PASSWORD, launchBrowser, screenshot, signIn, url } from './browser.mjs';
import { discPng } from './images.mjs';

// Photos from the bench (issue 15): the camera opens directly (`capture`), several photos
// go at once with a progress bar each, the chosen sample resets after the upload, and a
// photo is voided with a reason, never deleted: it stays, struck, with the reason.

const PHONE = { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true };
const DESK = { viewport: { width: 1366, height: 768 } };
const STAMP = Date.now().toString(36).toUpperCase();
const REASON = 'Blurred: the strands cannot be counted';

let admin;
let lot;
before(async () => {
  admin = await apiAs('admin@demo.example');
  const supplier = await admin('POST', '/suppliers', {
    name: `Photo Test Wire ${STAMP}`,
    code: `PTW-${STAMP}`.slice(0, 32),
    contactEmail: 'quality@photo-test.example',
  });
  const product = await admin('POST', '/products', {
    supplierId: supplier.id,
    sku: `PT-4AWG-${STAMP}`,
    kind: 'spool',
    description: '4 AWG power cable, 30 m spool',
    conductors: [{ purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper' }],
  });
  lot = await admin('POST', '/lots', {
    productId: product.id,
    poNumber: `PO-PHOTO-${STAMP}`,
    quantity: 20,
    unit: 'spools',
  });
  await admin('POST', `/lots/${lot.id}/samples`, {
    conductorId: product.conductors[0].id,
    seq: 1,
  });
});

test('on a phone in bench mode, two photos go at once with their progress, the sample resets, and the clerk voids one', async () => {
  const browser = await launchBrowser(PHONE);
  try {
    const page = await browser.context.newPage();
    await signIn(page, 'clerk@demo.example');
    await page.waitForURL((u) => u.pathname === '/today');
    await page.goto(url(`/lots/${lot.id}/bench`));
    await page.getByRole('heading', { name: 'Photos (0)' }).waitFor();

    const camera = page.getByLabel('Photos from the camera');
    assert.equal(await camera.getAttribute('capture'), 'environment', 'the camera opens directly');
    assert.notEqual(await camera.getAttribute('multiple'), null, 'several at once');

    await page.getByRole('combobox', { name: 'Sample (optional)' }).tap();
    await page.getByRole('option', { name: /^Unit 1 · power 4 AWG/ }).tap();
    await page.getByRole('textbox', { name: 'Caption (optional)' }).fill('Unit 1 cut ends');
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Take photos' }).tap();
    await (
      await chooser
    ).setFiles([
      { name: 'end-a.png', mimeType: 'image/png', buffer: discPng(400) },
      { name: 'end-b.png', mimeType: 'image/png', buffer: discPng(300) },
    ]);
    const uploads = page.getByRole('list', { name: 'Uploads' });
    await uploads.getByText('end-a.png: uploaded').waitFor();
    await uploads.getByText('end-b.png: uploaded').waitFor();
    assert.equal(await uploads.getByRole('progressbar').count(), 2, 'a progress bar per photo');
    await page.getByRole('heading', { name: 'Photos (2)' }).waitFor();
    // The batch is filed under its sample; the picker is back at the lot as a whole.
    await page
      .getByRole('combobox', { name: 'Sample (optional)' })
      .getByText('The lot as a whole')
      .waitFor();
    assert.equal(await page.getByRole('textbox', { name: 'Caption (optional)' }).inputValue(), '');
    const stored = await admin('GET', `/lots/${lot.id}`);
    assert.deepEqual(
      stored.photos.map((p) => [p.caption, p.sampleId === stored.samples[0].id]),
      [
        ['Unit 1 cut ends', true],
        ['Unit 1 cut ends', true],
      ],
    );

    // Void the second: it stays, struck, with the reason.
    await page.getByRole('img', { name: 'Unit 1 cut ends' }).last().tap();
    await page.getByRole('button', { name: 'Void…' }).tap();
    const dialog = page.getByRole('dialog', { name: 'Void this photo?' });
    await dialog.getByRole('textbox', { name: 'Reason' }).fill('blurred');
    await dialog.getByRole('button', { name: 'Void photo' }).tap();
    await dialog.getByText('Say why, in at least 10 characters.').waitFor();
    await dialog.getByRole('textbox', { name: 'Reason' }).fill(REASON);
    await dialog.getByRole('button', { name: 'Void photo' }).tap();
    await page.getByRole('heading', { name: 'Photos (1, 1 void)' }).waitFor();
    await page.getByText(`Void: ${REASON}`).waitFor();
    await page.getByLabel('Void: Unit 1 cut ends').waitFor();
    await page.getByRole('heading', { name: 'Photos (1, 1 void)' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'bench-phone-photos-void');

    const afterVoid = await admin('GET', `/lots/${lot.id}`);
    assert.equal(afterVoid.photos.length, 2, 'nothing deleted');
    assert.deepEqual(
      afterVoid.photos.map((p) => [p.voided, p.voidReason]),
      [
        [false, null],
        [true, REASON],
      ],
    );
  } finally {
    await browser.close();
  }
});

test("at a desk, a clerk cannot void another's photo; the QA lead can, and sees it struck", async () => {
  const browser = await launchBrowser(DESK);
  try {
    const page = await browser.context.newPage();
    await signIn(page, 'clerk@demo.example');
    await page.waitForURL((u) => u.pathname === '/today');
    // The QA lead's photo of the lot: the clerk is not offered its Void.
    const form = new FormData();
    form.append('file', new Blob([discPng(200)], { type: 'image/png' }), 'label.png');
    form.append('caption', 'Reel label by QA');
    const login = await fetch(url('/api/auth/login'), {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'qa@demo.example', password: DEMO_PASSWORD }),
    });
    const { accessToken } = await login.json();
    const posted = await fetch(url(`/api/lots/${lot.id}/photos`), {
      method: 'POST',
      headers: { Authorization: `Bearer ${accessToken}` },
      body: form,
    });
    assert.equal(posted.status, 201);
    await page.goto(url(`/lots/${lot.id}`));
    await page.getByRole('img', { name: 'Reel label by QA' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Close' }).waitFor();
    assert.equal(await page.getByRole('button', { name: 'Void…' }).count(), 0);
    await page.getByRole('dialog').getByRole('button', { name: 'Close' }).click();

    await page
      .getByRole('button', { name: /Clerk|Rosa/ })
      .first()
      .click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.waitForURL((u) => u.pathname === '/sign-in');
    // Signing in again brings the QA lead back to the lot.
    await signIn(page, 'qa@demo.example');
    await page.waitForURL((u) => u.pathname === `/lots/${lot.id}`);
    await page.getByRole('img', { name: 'Unit 1 cut ends' }).first().click();
    await page.getByRole('button', { name: 'Void…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Void this photo?' });
    await dialog.getByRole('textbox', { name: 'Reason' }).fill('Shows the reel of another lot');
    await dialog.getByRole('button', { name: 'Void photo' }).click();
    await page.getByRole('heading', { name: 'Photos (1, 2 void)' }).waitFor();
    await page.getByText('Void: Shows the reel of another lot').waitFor();
    await page.getByRole('heading', { name: 'Photos (1, 2 void)' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'lot-desk-photos-void');
  } finally {
    await browser.close();
  }
});
