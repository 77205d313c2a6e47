import assert from 'node:assert/strict';
import { test } from 'node:test';
import { apiAs, lotAwaitingReject } from './api-fixtures.mjs';
import { browserForFile, launchBrowser, screenshot, signIn, signInToLot, url } from './browser.mjs';

// An invented supplier and a 4 AWG copper spool of it (see lotAwaitingReject).
const STAMP = Date.now().toString(36).toUpperCase();
export const DECISIONS_PO = `PO-E2E-DEC-${STAMP}`;

/** A lot awaiting decision: 3 spools cut, 2 far under their copper (a reject is due). */
async function lotAwaitingDecision() {
  const detail = await lotAwaitingReject(await apiAs('admin@demo.example'), {
    supplier: `Copperline Test Wire ${STAMP}`,
    code: `CTW${STAMP}`,
    sku: `CTW-4-${STAMP}`,
    purpose: 'power',
    poNumber: DECISIONS_PO,
  });
  assert.equal(detail.status, 'awaiting_decision');
  assert.equal(detail.evaluation.recommendation, 'reject');
  return detail;
}

const MAILDEV_URL = process.env.MAILDEV_URL;

/** The e-mails MailDev holds for `to` whose subject starts with `subject`. */
async function mailsTo(to, subject) {
  const all = await (await fetch(`${MAILDEV_URL}/api/email`)).json();
  return all.filter((e) => e.subject.startsWith(subject) && e.to.some((a) => a.address === to))
    .length;
}

/** The one such e-mail, waiting a little for it. */
async function mailTo(to, subject) {
  for (let i = 0; i < 100; i++) {
    const all = await (await fetch(`${MAILDEV_URL}/api/email`)).json();
    const found = all.filter(
      (e) => e.subject.startsWith(subject) && e.to.some((a) => a.address === to),
    );
    if (found.length) return found[0];
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no e-mail "${subject}…" to ${to} in MailDev`);
}

let page;
browserForFile((p) => {
  page = p;
});

test('a QA lead rejects a lot with a reason, sees the NCR number and prints the tag', async () => {
  const lot = await lotAwaitingDecision();

  await signInToLot(page, 'qa@demo.example', lot.id);
  const panel = page.locator('[aria-label="Decision panel"]');
  // On a laptop screen the decision is below the readings: the recommendation leads to it.
  await page.getByRole('button', { name: 'Go to the decision' }).click();
  await panel.getByText('Recommendation:').waitFor();
  await page.waitForFunction(() => {
    const top = globalThis.document.getElementById('decision')?.getBoundingClientRect().top ?? -1;
    return top >= 0 && top < globalThis.innerHeight / 2;
  });
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

test('a concession against a reject: terms with the safety caution, a second approver, the terms on the tag', async (t) => {
  const lot = await lotAwaitingReject(await apiAs('admin@demo.example'), {
    supplier: `Copperline Concession Wire ${STAMP}`,
    code: `CCW${STAMP}`,
    sku: `CCW-4-${STAMP}`,
    purpose: 'ground',
    poNumber: `PO-E2E-CON-${STAMP}`,
  });
  const qaBrowser = await launchBrowser();
  const adminBrowser = await launchBrowser();
  t.after(async () => {
    await qaBrowser.close();
    await adminBrowser.close();
  });
  const qa = await qaBrowser.context.newPage();
  await signInToLot(qa, 'qa@demo.example', lot.id);
  const panel = qa.locator('[aria-label="Decision panel"]');
  await panel.getByRole('radio', { name: 'Accept on concession' }).check();
  const terms = panel.getByRole('group', { name: 'Concession terms' });
  await terms.getByText('Safety caution').waitFor();
  await terms
    .getByText(/Follow local codes, the equipment maker's instructions and licensed practice/)
    .waitFor();
  await panel.getByRole('button', { name: 'Ask for the concession' }).click();
  await terms
    .getByText('Say in at least 10 characters what the material may be used for.')
    .waitFor();
  await terms
    .getByLabel('May be used for')
    .fill('Ground straps of 0.5 m or less on the demo bench only');
  await terms.getByLabel(/Quantity/).fill('2');
  await terms
    .getByLabel('Holds until')
    .fill(new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10));
  await panel
    .getByLabel(/Reason \(required\)/)
    .fill('The ground run carries no load current here; the power side is refused.');
  await screenshot(qa, 'concession-dialog');
  await panel.getByRole('button', { name: 'Ask for the concession' }).click();
  const waiting = panel.getByRole('region', { name: 'Concession waiting for approval' });
  await waiting.getByText(/You asked for it: another QA lead or an admin approves it/).waitFor();
  assert.equal(await waiting.getByRole('button', { name: 'Approve the concession' }).count(), 0);

  // The admin, who may approve, is told by e-mail (through MailDev) and on Today.
  const subject = `Lot ${lot.id}: a concession awaits your approval (asked by `;
  const notice = await mailTo('admin@demo.example', subject);
  assert.match(notice.text, /Ground straps of 0\.5 m or less on the demo bench only/);
  assert.ok(notice.text.includes(`/lots/${lot.id}`), 'the e-mail links the lot');
  assert.equal(await mailsTo('qa@demo.example', subject), 0, 'not to its requester');
  const admin = await adminBrowser.context.newPage();
  await admin.goto(url('/'));
  await signIn(admin, 'admin@demo.example');
  await admin.waitForURL((u) => u.pathname === '/today');
  const awaiting = admin.getByRole('region', { name: 'Concessions awaiting your approval' });
  const item = awaiting.getByRole('link', { name: new RegExp(`^Lot ${lot.id} `) });
  await item.getByText(/Ground straps of 0\.5 m or less/).waitFor();
  await screenshot(admin, 'today-concession-awaiting');
  await item.click();
  await admin.waitForURL((u) => u.pathname === `/lots/${lot.id}`);
  const adminPanel = admin.locator('[aria-label="Decision panel"]');
  await adminPanel.getByRole('button', { name: 'Approve the concession' }).click();
  await adminPanel.getByText('Accepted on concession', { exact: true }).waitFor();
  await adminPanel.getByText(/Use only for: Ground straps of 0\.5 m or less/).waitFor();
  await screenshot(admin, 'concession-approved');
  const tag = await admin.request.get(url(`/api/lots/${lot.id}/tag.pdf`));
  assert.equal(tag.status(), 200);
  assert.equal((await tag.body()).subarray(0, 5).toString('latin1'), '%PDF-');
});
