import assert from 'node:assert/strict';
import { after, before, test } from 'node:test';
import { launchBrowser, screenshot, signIn, url } from './browser.mjs';
import { discPng } from './images.mjs';

const PO = `PO-E2E-${Date.now().toString(36).toUpperCase()}`;

const escape = (text) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

let browser;
let page;
before(async () => {
  browser = await launchBrowser();
  page = await browser.context.newPage();
});
after(async () => {
  await browser?.close();
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
