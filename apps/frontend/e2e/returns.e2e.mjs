import assert from 'node:assert/strict';
import { readFile } from 'node:fs/promises';
import { test } from 'node:test';
import { apiAs, lotAwaitingReject } from './api-fixtures.mjs';
import { browserForFile, launchBrowser, screenshot, signIn, url } from './browser.mjs';

const STAMP = Date.now().toString(36).toUpperCase();

/**
 * A rejected lot not yet on a return: the one decisions.e2e.mjs rejected when it ran first
 * in this server, otherwise one built (lotAwaitingReject) and rejected here.
 */
async function rejectedLot(request) {
  const found = await request.get(url('/api/lots?status=rejected&q=PO-E2E-DEC-&pageSize=1'));
  assert.equal(found.status(), 200);
  const { items } = await found.json();
  if (items[0]) return items[0];
  const call = await apiAs('admin@demo.example');
  const lot = await lotAwaitingReject(call, {
    supplier: `Copperline Return Wire ${STAMP}`,
    code: `CRW${STAMP}`,
    sku: `CRW-4-${STAMP}`,
    purpose: 'ground',
    poNumber: `PO-E2E-RET-${STAMP}`,
  });
  await call('POST', `/lots/${lot.id}/decisions`, {
    outcome: 'reject',
    reason: 'Two of three units measure as 8 AWG.',
    version: lot.version,
  });
  return call('GET', `/lots/${lot.id}`);
}

let page;
browserForFile((p) => {
  page = p;
});

test('purchasing raises a return for a rejected lot, downloads its CSV and e-mails the supplier', async () => {
  await page.goto(url('/sign-in'));
  await signIn(page, 'buyer@demo.example');
  await page.waitForURL((u) => u.pathname !== '/sign-in');
  const lot = await rejectedLot(page.request);

  // From the lot page: "Raise return" opens the form with the lot preselected.
  await page.goto(url(`/lots/${lot.id}`));
  await page.getByRole('link', { name: 'Raise return' }).click();
  await page.waitForURL((u) => u.pathname === '/returns');
  const dialog = page.getByRole('dialog');
  const box = dialog.getByRole('checkbox', { name: new RegExp(`^Lot ${lot.id} · PO`) });
  await box.waitFor();
  assert.ok(await box.isChecked(), 'the lot from the lot page is ticked');
  await dialog.getByLabel('Supplier RMA number (optional)').fill(`RMA-${STAMP}`);
  await dialog.getByLabel('Inspection hours').fill('2.5');
  await dialog.getByLabel('Hourly rate').fill('48');
  await dialog.getByLabel('Freight').fill('35.50');
  await dialog.getByLabel('Other').fill('-3');
  await dialog.getByText('A number ≥ 0 with at most 2 decimals.').waitFor();
  await dialog.getByLabel('Other').fill('12.25');
  // 2.5 h × 48 + 35.50 + 12.25 = 167.75
  await dialog.getByRole('status', { name: 'Chargeback total' }).getByText('167.75').waitFor();
  await screenshot(page, 'return-new');
  await dialog.getByRole('button', { name: 'Raise the return' }).click();
  await page.waitForURL((u) => /^\/returns\/\d+$/.test(u.pathname));
  await page.getByRole('heading', { name: /^Return RTV-\d{4}-\d{4}$/ }).waitFor();
  await page.getByRole('list', { name: 'Lots on the return' }).getByText(`Lot ${lot.id}`).waitFor();
  await page.getByRole('button', { name: 'Record shipment' }).waitFor();
  await page.getByRole('button', { name: 'Cancel the return' }).waitFor();

  // The readings CSV: one row per reading, with the lot and the verdicts.
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Download CSV' }).click(),
  ]);
  const csv = await readFile(await download.path(), 'utf8');
  const [header, ...rows] = csv.trim().split(/\r?\n/);
  // Headers in words with units, for the supplier (issue 14).
  assert.match(header, /^\ufeff?Reading,Lot,Supplier lot code,PO,Packing slip,RTV,RMA,NCR,/);
  assert.match(header, /,"U, k=2 \(mm²\)",/);
  assert.equal(rows.length, 3, 'three readings');
  assert.ok(rows.every((r) => new RegExp(`^\\d+,${lot.id},[^,]*,${lot.poNumber},`).test(r)));
  assert.equal(rows.filter((r) => r.includes('nonconforming')).length, 2);

  // The e-mail goes through the runner's MailDev.
  await page.getByRole('button', { name: 'E-mail supplier' }).click();
  const mail = page.getByRole('dialog');
  assert.match(await mail.getByLabel('To').inputValue(), /@/);
  await mail
    .getByLabel('A line of your own (optional)')
    .fill('Please send an RMA and collect the spools.');
  await mail.getByRole('button', { name: 'Send the notice' }).click();
  const row = page.getByRole('list', { name: 'Outbound messages' }).getByRole('listitem').first();
  await row.getByText('Sent', { exact: true }).waitFor();
  await row.getByText(/readings\.csv, RTV-\d{4}-\d{4}-evidence\.pdf/).waitFor();
  // E-mailing the draft marked it e-mailed (before its documents were built).
  await page
    .getByRole('list', { name: 'Return history' })
    .getByText(/^Notice e-mailed/)
    .waitFor();

  // The goods leave: carrier, tracking, date and quantity; a missing carrier is named.
  await page.getByRole('button', { name: 'Record shipment' }).click();
  const ship = page.getByRole('dialog');
  await ship.getByRole('button', { name: 'Record the shipment' }).click();
  await ship.getByText('Name the carrier.').waitFor();
  await ship.getByLabel('Carrier').fill('Northline Freight');
  await ship.getByLabel('Tracking number').fill('NF-4471-2200');
  await ship.getByRole('button', { name: 'Record the shipment' }).click();
  await page
    .getByRole('list', { name: 'Return history' })
    .getByText(/^Shipped .* by Northline Freight, tracking NF-4471-2200/)
    .waitFor();
  await page.getByRole('button', { name: 'Mark as acknowledged' }).waitFor();
  await screenshot(page, 'return-detail');

  // Every message, with its fate, on the Messages screen.
  await page.getByRole('link', { name: 'Messages' }).first().click();
  await page.waitForURL((u) => u.pathname === '/messages');
  const sent = page.getByRole('list', { name: 'Outbound messages' });
  await sent
    .getByText(/· Return RTV-\d{4}-\d{4}: rejected cable from/)
    .first()
    .waitFor();
  await sent
    .getByText(/replies to buyer@demo\.example/)
    .first()
    .waitFor();
  await screenshot(page, 'messages');
  // Dismiss the toasts this test queued (raised, sent, shipped) so none waits for the next.
  const toast = page.locator('.MuiSnackbar-root').getByRole('button', { name: 'Close' });
  while ((await toast.count()) > 0) await toast.first().click();

  await page.getByRole('link', { name: 'Returns' }).first().click();
  await page.waitForURL((u) => u.pathname === '/returns');
  await page.getByRole('table', { name: 'Returns' }).getByText(`RMA-${STAMP}`).waitFor();
  await screenshot(page, 'returns-list');
});

test('purchasing raises a corrective action request for the supplier and records its response', async () => {
  const found = await page.request.get(
    url('/api/lots?status=returned,rejected&q=PO-E2E-&pageSize=1'),
  );
  const [lot] = (await found.json()).items;
  assert.ok(lot, 'the rejected lot of the first test');
  await page.getByRole('link', { name: 'Corrective actions' }).first().click();
  await page.waitForURL((u) => u.pathname === '/corrective-actions');
  await page.getByRole('button', { name: 'New SCAR' }).click();
  const dialog = page.getByRole('dialog');
  await dialog.getByRole('combobox', { name: 'Supplier' }).fill(lot.supplier.code);
  await page.getByRole('option', { name: new RegExp(lot.supplier.code) }).click();
  await dialog.getByRole('checkbox', { name: new RegExp(`^Lot ${lot.id} · PO`) }).check();
  await dialog
    .getByLabel('Problem')
    .fill('4 AWG spools measure as 8 AWG: copper area about 40 % of the label.');
  // A due date in the past is refused as it is typed.
  await dialog.getByLabel('Response due on').fill('2020-01-31');
  await dialog.getByText('The due date cannot be in the past.').waitFor();
  const due = new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10);
  await dialog.getByLabel('Response due on').fill(due);
  await dialog.getByRole('button', { name: 'Raise the request' }).click();
  await page.waitForURL((u) => /^\/corrective-actions\/\d+$/.test(u.pathname));
  await page.getByRole('heading', { name: /^SCAR-\d{4}-\d{4}$/ }).waitFor();
  const form = page.getByRole('form', { name: 'Supplier response' });
  await form.getByLabel('Containment').fill('Stock of the same reel batch quarantined and sorted.');
  await form
    .getByLabel('Root cause')
    .fill('The extruder line ran 8 AWG strand packs under 4 AWG jackets.');
  await form
    .getByLabel('Corrective action')
    .fill('Strand count checked at the line for every reel change.');
  await form.getByRole('button', { name: 'Record the response' }).click();
  await page.getByRole('button', { name: 'Verify the response' }).waitFor();
  await page.getByRole('button', { name: 'Reopen' }).waitFor();
  await screenshot(page, 'corrective-action-detail');
  // A toast left from the e-mail step pauses while the pointer rests on it; let it go.
  await page.mouse.move(640, 10);
  await page.locator('.MuiSnackbar-root').waitFor({ state: 'detached', timeout: 15_000 });
  await page.getByRole('button', { name: 'Verify the response' }).click();
  // Verifying needs evidence; who and when are recorded.
  const verify = page.getByRole('dialog');
  await verify.getByRole('button', { name: 'Verify' }).click();
  await verify.getByText('Write at least 10 characters.').waitFor();
  await verify
    .getByLabel('Evidence that the fix works')
    .fill('The next two deliveries measured full 4 AWG copper.');
  await verify.getByRole('button', { name: 'Verify' }).click();
  await page
    .getByText(/by Priya Marchetti: The next two deliveries measured full 4 AWG copper\./)
    .waitFor();
  await page.getByRole('button', { name: 'Close' }).filter({ hasText: 'Close' }).waitFor();
  await page.getByRole('link', { name: 'All corrective actions' }).click();
  await page
    .getByRole('table', { name: 'Corrective actions' })
    .getByText('Verified')
    .first()
    .waitFor();
  await screenshot(page, 'corrective-actions-list');
});

test("a QA lead finds a returned lot's evidence as the supplier received it: nothing to void or add", async () => {
  const found = await page.request.get(url('/api/lots?status=returned&q=PO-E2E-&pageSize=1'));
  const [lot] = (await found.json()).items;
  assert.ok(lot, 'the lot the first test returned');
  const qa = await launchBrowser();
  try {
    const qaPage = await qa.context.newPage();
    await qaPage.goto(url('/sign-in'));
    await signIn(qaPage, 'qa@demo.example');
    await qaPage.waitForURL((u) => u.pathname !== '/sign-in');
    await qaPage.goto(url(`/lots/${lot.id}`));
    await qaPage
      .getByRole('note', { name: 'Evidence as sent' })
      .getByText(/went back to the supplier/)
      .waitFor();
    await qaPage.getByRole('heading', { name: /^Photos/ }).waitFor();
    // The readings are shown (a QA lead could void any of them before), none with a Void;
    // photos can be neither taken nor chosen.
    await qaPage.getByRole('table', { name: 'Readings' }).first().waitFor();
    assert.equal(await qaPage.getByRole('button', { name: 'Void', exact: true }).count(), 0);
    assert.equal(await qaPage.getByRole('button', { name: 'Take photos' }).count(), 0);
    assert.equal(await qaPage.getByRole('button', { name: 'Choose photos' }).count(), 0);
    await qaPage.getByText('This lot has gone back to the supplier').first().waitFor();
    await screenshot(qaPage, 'lot-returned-evidence-frozen');
  } finally {
    await qa.close();
  }
});
