import assert from 'node:assert/strict';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import Database from 'better-sqlite3';
import { apiAs, lotAwaitingReject } from './api-fixtures.mjs';
import { DEMO_PASSWORD, launchBrowser, screenshot, signIn, url } from './browser.mjs';

const STAMP = Date.now().toString(36).toUpperCase();
const MAILDEV_URL = process.env.MAILDEV_URL;

/** The e-mails MailDev holds whose subject is `subject`, waiting a little for them. */
async function mailsTitled(subject, atLeast = 1) {
  for (let i = 0; i < 100; i++) {
    const all = await (await fetch(`${MAILDEV_URL}/api/email`)).json();
    const found = all.filter((e) => e.subject === subject);
    if (found.length >= atLeast) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no e-mail "${subject}" in MailDev`);
}

let browser;
let phone;
let staff;
before(async () => {
  browser = await launchBrowser();
  staff = await browser.context.newPage();
  phone = await launchBrowser({
    viewport: { width: 390, height: 844 },
    isMobile: true,
    hasTouch: true,
  });
});
after(async () => {
  await browser?.close();
  await phone?.close();
});

test('the supplier answers a SCAR from the e-mailed link, on a phone, with a photo; purchasing sees it arrive', async () => {
  assert.ok(MAILDEV_URL, 'the runner starts MailDev');
  const admin = await apiAs('admin@demo.example');
  const lot = await lotAwaitingReject(admin, {
    supplier: `Brightmoor Portal Wire ${STAMP}`,
    code: `BPW${STAMP}`,
    sku: `BPW-4-${STAMP}`,
    purpose: 'power',
    poNumber: `PO-E2E-PORTAL-${STAMP}`,
  });
  await admin('POST', `/lots/${lot.id}/decisions`, {
    outcome: 'reject',
    reason: 'Two of three units measure as 8 AWG.',
    version: lot.version,
  });
  const buyer = await apiAs('buyer@demo.example');
  const due = new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10);
  const car = await buyer('POST', '/corrective-actions', {
    supplierId: lot.supplier.id,
    lotIds: [lot.id],
    problem: '4 AWG power spools measure as 8 AWG: about 40 % of the copper.',
    dueOn: due,
  });

  // Purchasing sends it from the SCAR page.
  await staff.goto(url('/sign-in'));
  await signIn(staff, 'buyer@demo.example');
  await staff.waitForURL((u) => u.pathname !== '/sign-in');
  await staff.goto(url(`/corrective-actions/${car.id}`));
  await staff.getByRole('button', { name: 'E-mail the supplier a link to answer' }).click();
  await staff.getByText(/^A link to answer went to quality@copperline-test\.example\.$/).waitFor();

  // The supplier opens the link from the received mail, without an account.
  const [mail] = await mailsTitled(`${car.number}: corrective action requested`);
  const link = /(http\S+\/supplier\/[A-Za-z0-9_.-]+)/.exec(mail.text)[1];
  const page = await phone.context.newPage();
  await page.goto(link);
  await page.getByRole('heading', { name: `Corrective action request ${car.number}` }).waitFor();
  await page.getByText(`PO PO-E2E-PORTAL-${STAMP}`, { exact: false }).waitFor();
  const body = await page.locator('body').innerText();
  // One request only: no other supplier, no demo data, no staff address, no navigation.
  for (const leak of ['Quickamp', 'buyer@demo.example', 'Returns', 'Scorecards', 'Lot ' + lot.id]) {
    assert.ok(!body.includes(leak), `the page does not show "${leak}"`);
  }
  await page.getByRole('button', { name: 'Send the answer' }).click();
  await page.getByText('Describe the containment in at least 10 characters.').waitFor();
  await page
    .getByLabel('Containment')
    .fill('All reels of the batch quarantined, here and at two distributors.');
  await page
    .getByLabel('Root cause')
    .fill('An 8 AWG strand pack was loaded on the 4 AWG line after a changeover.');
  await page
    .getByLabel('Corrective action')
    .fill('Strand count checked and signed at every reel change; operators trained.');
  await page.getByLabel('In place by').fill(due);
  await screenshot(page, 'supplier-portal-phone');
  // 1×1 PNG (the PNG specification's signature, IHDR, IDAT, IEND).
  const png = Buffer.from(
    'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8DwHwAFBQIAX8jx0gAAAABJRU5ErkJggg==',
    'base64',
  );
  await page
    .getByLabel('File to send')
    .setInputFiles({ name: 'reel-change-sheet.png', mimeType: 'image/png', buffer: png });
  await page.getByRole('list', { name: 'Your files' }).getByText('reel-change-sheet.png').waitFor();
  await page.getByLabel('File to send').setInputFiles({
    name: 'fake.pdf',
    mimeType: 'application/pdf',
    buffer: Buffer.from('not a pdf'),
  });
  await page.getByText(/Send a PDF or an image/).waitFor();
  await page.getByRole('button', { name: 'Send the answer' }).click();
  await page.getByText(/^Your answer arrived/).waitFor();
  await screenshot(page, 'supplier-portal-answered');

  // A tampered link and an expired one are refused with a clear page.
  await page.goto(link.replace(/.(\.[^.]+)$/, (m, rest) => (m[0] === 'A' ? 'B' : 'A') + rest));
  await page.getByRole('heading', { name: 'This link cannot be used' }).waitFor();
  await page.getByText(/^This link is not valid/).waitFor();
  const db = new Database(join(process.env.E2E_SCRATCH, 'gaugeproof.sqlite'));
  try {
    db.prepare('update supplier_links set expires_at = ? where corrective_action_id = ?').run(
      Date.now() - 60_000,
      car.id,
    );
  } finally {
    db.close();
  }
  await page.goto(link);
  await page.getByText(/^This link expired on \d{4}-\d{2}-\d{2}/).waitFor();
  await screenshot(page, 'supplier-portal-expired');

  // Purchasing sees the answer arrive, who and when, with the file.
  await staff.reload();
  await staff.getByText('Responded', { exact: true }).first().waitFor();
  await staff.getByText(/supplier link \(quality@copperline-test\.example\)/).waitFor();
  await staff
    .getByRole('list', { name: 'Files from the supplier' })
    .getByText('reel-change-sheet.png')
    .waitFor();
  await screenshot(staff, 'corrective-action-answered');
});

/** Uploads a photo to a lot as `email`, through the API the lot page uses. */
async function photoOnLot(email, lotId, png) {
  const login = await fetch(url('/api/auth/login'), {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  const { accessToken } = await login.json();
  const form = new FormData();
  form.append('file', new Blob([png], { type: 'image/png' }), 'cut-end.png');
  form.append('caption', 'Internal: reel label looked re-printed');
  const res = await fetch(url(`/api/lots/${lotId}/photos`), {
    method: 'POST',
    headers: { Authorization: `Bearer ${accessToken}` },
    body: form,
  });
  assert.equal(res.status, 201, `photo upload → ${res.status} ${await res.text()}`);
}

test('a return notice e-mails the supplier a link to a page of that lot only: what was found, its photo, the evidence pack', async (t) => {
  assert.ok(MAILDEV_URL, 'the runner starts MailDev');
  const admin = await apiAs('admin@demo.example');
  const lot = await lotAwaitingReject(admin, {
    supplier: `Kestrel Return Wire ${STAMP}`,
    code: `KRW${STAMP}`,
    sku: `KRW-4-${STAMP}`,
    purpose: 'power',
    poNumber: `PO-E2E-RTV-${STAMP}`,
  });
  await admin('POST', `/lots/${lot.id}/decisions`, {
    outcome: 'reject',
    reason: 'Internal: two of three units measure as 8 AWG.',
    version: lot.version,
  });
  // A second rejected lot of the same supplier, with its own photo, stays off the page.
  const other = await lotAwaitingReject(admin, {
    supplier: `Kestrel Other Wire ${STAMP}`,
    code: `KOW${STAMP}`,
    sku: `KOW-4-${STAMP}`,
    purpose: 'power',
    poNumber: `PO-E2E-OTHER-${STAMP}`,
  });
  const png = Buffer.from(
    'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8DwHwAFBQIAX8jx0gAAAABJRU5ErkJggg==',
    'base64',
  );
  await photoOnLot('clerk@demo.example', lot.id, png);
  await photoOnLot('clerk@demo.example', other.id, png);
  const buyer = await apiAs('buyer@demo.example');
  const ret = await buyer('POST', '/returns', {
    lotIds: [lot.id],
    notes: 'Internal: ask for a discount instead',
    supplierNote: 'Two of three spools measure as 8 AWG, not the 4 AWG ordered.',
  });

  // Purchasing sends the notice from the return's page; the dialog says what goes out.
  const own = await launchBrowser();
  t.after(() => own.close());
  const staff = await own.context.newPage();
  await staff.goto(url('/sign-in'));
  await signIn(staff, 'buyer@demo.example');
  await staff.waitForURL((u) => u.pathname !== '/sign-in');
  await staff.goto(url(`/returns/${ret.id}`));
  await staff.getByRole('button', { name: 'E-mail supplier' }).click();
  const dialog = staff.getByRole('dialog');
  await dialog.getByText(/a link to a page of their own showing what we found/).waitFor();
  await dialog.getByText(/Their reply comes to your own e-mail address/).waitFor();
  await screenshot(staff, 'return-notice-dialog');
  await dialog.getByRole('button', { name: 'Send the notice' }).click();
  await staff.getByText(/^The return notice went to quality@copperline-test\.example/).waitFor();

  const [mail] = await mailsTitled(
    `Return ${ret.number}: rejected cable from Kestrel Return Wire ${STAMP}`,
  );
  assert.ok(!mail.text.includes('Internal'), 'no internal note or reason in the e-mail');
  const link = /(http\S+\/supplier\/[A-Za-z0-9_.-]+)/.exec(mail.text)[1];
  const page = await phone.context.newPage();
  await page.goto(link);
  await page.getByRole('heading', { name: `Return notice ${ret.number}` }).waitFor();
  await page.getByText(`PO PO-E2E-RTV-${STAMP} · received`, { exact: false }).waitFor();
  await page.getByText('Two of three spools measure as 8 AWG, not the 4 AWG ordered.').waitFor();
  const photos = page.getByRole('list', { name: 'Photos' }).getByRole('img');
  assert.equal(await photos.count(), 1, 'the photo of that lot only');
  await photos
    .first()
    .evaluate((img) =>
      img.complete ? null : new Promise((r) => img.addEventListener('load', r, { once: true })),
    );
  assert.ok(
    await photos.first().evaluate((img) => img.naturalWidth > 0),
    'the photo loads from the public API',
  );
  const evidence = page.getByRole('link', { name: new RegExp(`^Evidence pack ${ret.number}`) });
  const pdf = await fetch(new URL(await evidence.getAttribute('href'), link));
  assert.equal(pdf.status, 200);
  assert.equal(pdf.headers.get('content-type'), 'application/pdf');
  const body = await page.locator('body').innerText();
  for (const leak of [
    'Internal',
    `PO-E2E-OTHER-${STAMP}`,
    'Kestrel Other',
    'buyer@demo.example',
    'Quickamp',
    'Scorecards',
    `Lot ${lot.id}`,
  ]) {
    assert.ok(!body.includes(leak), `the page does not show "${leak}"`);
  }
  // A notice takes no answer: there is no form to fill.
  assert.equal(await page.getByRole('button', { name: 'Send the answer' }).count(), 0);
  await screenshot(page, 'supplier-portal-return-notice-phone');
});
