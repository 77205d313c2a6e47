import assert from 'node:assert/strict';
import { test } from 'node:test';
import { browserForFile, screenshot, signIn, url } from './browser.mjs';
import { discPng } from './images.mjs';

const PO = `PO-E2E-${Date.now().toString(36).toUpperCase()}`;

const escape = (text) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

let page;
/** The lot the first test receives (PO with packing slip PS-77). */
let firstLotId;
browserForFile((p) => {
  page = p;
});

/** A seeded, active spool of an approved supplier whose first conductor is sold as copper. */
async function seededSpool() {
  const response = await page.request.get(url('/api/products?kind=spool&active=true&pageSize=100'));
  assert.equal(response.status(), 200, 'the product list answers');
  const { items } = await response.json();
  const product = items.find(
    (p) =>
      p.supplier.status === 'approved' &&
      p.inspectionState.severity !== 'discontinued' &&
      p.conductors[0]?.claimedMaterial === 'copper',
  );
  assert.ok(product, 'the demo data holds an approved copper spool product');
  return product;
}

test('a clerk receives a spool lot, records a mass reading and uploads a photo', async () => {
  await page.goto(url('/sign-in'));
  await signIn(page, 'clerk@demo.example');
  await page.waitForURL((u) => u.pathname === '/today');
  await page.getByRole('heading', { name: 'On hold' }).waitFor();
  await page.getByRole('heading', { name: 'Instruments due' }).waitFor();
  await screenshot(page, 'today-clerk');

  const product = await seededSpool();
  const conductor = product.conductors[0];

  await page.getByRole('link', { name: 'Receive a delivery' }).click();
  await page.waitForURL((u) => u.pathname === '/receiving');
  await chooseSpool(product);
  await page.getByRole('textbox', { name: 'PO number' }).fill(PO);
  await page.getByLabel('Packing-slip number').fill('PS-77');
  // Client validation as the clerk types: 0 is not a lot.
  await page.getByLabel('Quantity received').fill('0');
  await page.getByText('Enter a whole number of at least 1.').waitFor();
  // A lot of one (a single drum) is that one unit, inspected whole, with the rule beside it.
  await page.getByLabel('Quantity received').fill('1');
  const plan = page.getByLabel('Sampling plan');
  await plan.getByText('Inspect the one unit (spool): the lot is a single unit').waitFor();
  await plan
    .getByText(
      /ISO 2859-1: when the sample size equals or exceeds the lot size, inspect every unit/,
    )
    .waitFor();
  await screenshot(page, 'receiving-lot-of-one');
  await page.getByLabel('Quantity received').fill('40');
  await plan.getByText(/Cut \d+ spools|Inspect all \d+ spools/).waitFor();
  await page.getByText(/^Sampling plan for 40 spools\s*$/).waitFor(); // the server confirmed it
  const planText = await plan.textContent();
  assert.match(planText, /Code letter [A-R]/);
  assert.match(planText, /Accept ≤ \d+ nonconforming/);
  await screenshot(page, 'receiving-plan');

  await page.getByRole('button', { name: 'Receive and hold the lot' }).click();
  await page.waitForURL((u) => /^\/lots\/\d+$/.test(u.pathname));
  await page.getByText('On hold.', { exact: false }).first().waitFor();
  await page.getByText(PO).waitFor();
  firstLotId = Number(new URL(page.url()).pathname.split('/').pop());

  // Cut the first unit and weigh it: half the label's copper area over one metre
  // (A = m / (ρ L (1 + k)), copper 8.89 g/cm³, k = 2 %: IEC 60028, ASTM B496).
  const section = page
    .getByRole('region', { name: new RegExp(`${escape(conductor.gauge)} conductor`, 'i') })
    .first();
  await section.getByRole('button', { name: 'Add sample' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Add sample' }).click();
  await section.getByText('Unit 1', { exact: true }).waitFor();
  const massG = (conductor.nominalAreaMm2 * 0.5 * 8.89 * 1.02).toFixed(1);
  await section.getByLabel('Mass of the strands').fill(massG);
  await section.getByLabel('Cut length').fill('1000');
  const live = section.getByRole('status', { name: 'Live result' });
  await live.getByText('Preview — the server recomputes').waitFor();
  await live.getByText(/Measures as \d/).waitFor();
  await section.getByRole('combobox', { name: /Balance/ }).click();
  await page.locator('[role="option"]:not([aria-disabled="true"])').first().click();
  await section.getByRole('button', { name: 'Record mass reading' }).click();
  await section.getByText('(server result)', { exact: false }).waitFor();
  const measured = await section.getByText(/Measures as .*\(server result\)/).textContent();
  assert.match(measured, /Measures as \d+ AWG|Measures as [\d.]+ mm²/);
  await section.getByRole('img', { name: /Cross-sections to scale/ }).waitFor();
  await section.getByText('Safety caution').first().waitFor();

  // A photo of the cut sample, with the upload going through the progress bar.
  await page.getByLabel('Caption (optional)').fill('Unit 1 stripped');
  await page.getByLabel('Photo file').setInputFiles({
    name: 'unit-1.png',
    mimeType: 'image/png',
    buffer: discPng(),
  });
  await page.getByRole('img', { name: 'Unit 1 stripped' }).waitFor();
  await page.getByRole('heading', { name: 'Photos (1)' }).waitFor();
  // A text file dressed as a picture is refused before it is sent, and nothing is added.
  await page.getByLabel('Photo file').setInputFiles({
    name: 'notes.txt',
    mimeType: 'text/plain',
    buffer: Buffer.from('not an image'),
  });
  await page.getByText('notes.txt is not a JPEG, PNG or WebP image.').waitFor();
  await page.getByRole('heading', { name: 'Photos (1)' }).waitFor();
  await page.evaluate(() => globalThis.scrollTo(0, 0));
  await screenshot(page, 'lot-page-clerk');

  await page.getByRole('link', { name: 'Lots' }).first().click();
  await page.waitForURL((u) => u.pathname === '/lots');
  await page.getByRole('table', { name: 'Lots' }).getByText(PO).waitFor();
  await screenshot(page, 'lots-list');
});

/** Supplier and product of the seeded spool chosen on the Receiving form. */
async function chooseSpool(product) {
  await page.getByRole('combobox', { name: 'Supplier' }).fill(product.supplier.name);
  await page
    .getByRole('option', { name: new RegExp(escape(product.supplier.code)) })
    .first()
    .click();
  await page.getByRole('combobox', { name: 'Product' }).fill(product.sku);
  await page
    .getByRole('option', { name: new RegExp(escape(product.sku)) })
    .first()
    .click();
}

test('a PO and packing slip already received are named before saving; a second delivery is one tick', async () => {
  assert.ok(firstLotId, 'the first test received a lot');
  const product = await seededSpool();
  for (const size of [
    { width: 390, height: 844, name: 'phone' },
    { width: 1366, height: 768, name: 'desk' },
  ]) {
    await page.setViewportSize(size);
    await page.goto(url('/receiving'));
    await chooseSpool(product);
    // Typed as a clerk might: other letter case, spaces around.
    await page.getByRole('textbox', { name: 'PO number' }).fill(PO.toLowerCase());
    await page.getByLabel('Packing-slip number').fill(' ps-77 ');
    await page.getByLabel('Quantity received').fill('1');
    const warning = page.getByRole('alert', { name: 'Already received' });
    await warning.waitFor();
    const link = warning.getByRole('link', { name: `Lot ${firstLotId}` });
    assert.equal(await link.getAttribute('href'), `/lots/${firstLotId}`);
    assert.match(await warning.textContent(), /received .* by Rosa Okafor · 40 spools of/);
    await warning.scrollIntoViewIfNeeded();
    await screenshot(page, `receiving-already-received-${size.name}`);
    // The page does not scroll sideways for it.
    assert.ok(
      await page.evaluate(
        () => globalThis.document.documentElement.scrollWidth <= globalThis.innerWidth,
      ),
    );
    // Another slip on the same PO is an ordinary delivery: the warning goes.
    await page.getByLabel('Packing-slip number').fill('PS-78');
    await warning.waitFor({ state: 'detached' });
    await page.getByLabel('Packing-slip number').fill('PS-77');
    await warning.waitFor();
  }

  // Saving without the tick is stopped on the form, naming the lot; nothing is sent.
  await page.getByRole('button', { name: 'Receive and hold the lot' }).click();
  await page.getByText(`Already received as lot ${firstLotId}: open it`).waitFor();
  assert.equal(new URL(page.url()).pathname, '/receiving');

  // The tick receives it again as a new lot, on hold.
  await page.getByLabel('This is another delivery under the same slip: receive it again').check();
  await page.getByRole('button', { name: 'Receive again and hold the new lot' }).click();
  await page.waitForURL((u) => /^\/lots\/\d+$/.test(u.pathname));
  const secondId = Number(new URL(page.url()).pathname.split('/').pop());
  assert.notEqual(secondId, firstLotId);
  await page.getByText('On hold.', { exact: false }).first().waitFor();
  // A lot of one: one unit, inspected whole.
  await page
    .getByText(/Inspect the one unit/)
    .first()
    .waitFor();
  const again = await page.request.get(
    url(`/api/lots/received-before?poNumber=${encodeURIComponent(PO)}&packingSlip=PS-77`),
  );
  assert.deepEqual(
    (await again.json()).lots.map((l) => l.id),
    [firstLotId, secondId],
  );
});
