import assert from 'node:assert/strict';
import { readFile } from 'node:fs/promises';
import { before, test } from 'node:test';
import { apiAs, lotAwaitingReject } from './api-fixtures.mjs';
import { launchBrowser, screenshot, signIn, url } from './browser.mjs';

// The admin's audit trail screen, the Users screen's roles and the QA lead's Today
// (issue 15), at 390×844 and 1366×768.

const STAMP = Date.now().toString(36).toUpperCase();
let admin;
let rejectLot;
before(async () => {
  admin = await apiAs('admin@demo.example');
  rejectLot = await lotAwaitingReject(admin, {
    supplier: `Audit Test Wire ${STAMP}`,
    code: `ATW-${STAMP}`,
    sku: `AT-4AWG-${STAMP}`,
    purpose: 'power',
    poNumber: `PO-AUDIT-${STAMP}`,
  });
});

for (const [size, options] of [
  ['desk', { viewport: { width: 1366, height: 768 }, acceptDownloads: true }],
  ['phone', { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true }],
]) {
  test(`${size}: the admin filters the audit trail to one lot and exports it as CSV`, async () => {
    const browser = await launchBrowser(options);
    try {
      const page = await browser.context.newPage();
      await signIn(page, 'admin@demo.example');
      await page.waitForURL((u) => u.pathname === '/today');
      await page.goto(url(`/audit?entityType=lot&entityId=${rejectLot.id}`));
      const table = page.getByRole('table', { name: 'Audit trail' });
      await table.getByText('lot.create').first().waitFor();
      const actions = await table.locator('tbody tr').allTextContents();
      assert.ok(actions.length >= 1);
      assert.ok(
        actions.every((row) => row.includes(`lot ${rejectLot.id}`)),
        actions.join('\n'),
      );
      const width = await page.evaluate(() => globalThis.document.documentElement.scrollWidth);
      if (size === 'desk') assert.ok(width <= 1366, `the page is ${width} px wide`);
      await screenshot(page, `audit-trail-${size}`);

      if (size === 'desk') {
        const download = page.waitForEvent('download');
        await page.getByRole('button', { name: /CSV/ }).click();
        const file = await (await download).path();
        const text = (await readFile(file, 'utf8')).replace(/^\ufeff/, '');
        const lines = text.trim().split(/\r?\n/);
        assert.match(
          lines[0],
          /^eventId,at,actorId,actorEmail,actorName,action,entityType,entityId/,
        );
        assert.ok(lines.slice(1).every((l) => l.includes(`,lot,${rejectLot.id},`)));

        // The action filter narrows to one kind of event.
        await page.goto(url('/audit'));
        await page.getByRole('combobox', { name: 'Action' }).click();
        await page.getByRole('option', { name: 'audit.export' }).click();
        await page.waitForURL((u) => u.searchParams.get('action') === 'audit.export');
        await table.getByText('lot.create').first().waitFor({ state: 'detached' });
        await table.getByText('audit.export').first().waitFor();

        await page.goto(url('/users'));
        const roles = page.getByRole('region', { name: 'What each role may do' });
        await roles.getByText('Receiving clerk').waitFor();
        await roles.getByText('Read the audit trail of every change and export it.').waitFor();
        await screenshot(page, 'users-roles-desk');
      }
    } finally {
      await browser.close();
    }
  });
}

test('Today shows the QA lead the lots at their reject number', async () => {
  const browser = await launchBrowser({ viewport: { width: 1366, height: 768 } });
  try {
    const page = await browser.context.newPage();
    await signIn(page, 'qa@demo.example');
    await page.waitForURL((u) => u.pathname === '/today');
    const section = page.getByRole('region', { name: 'At the reject number' });
    await section.getByText(`Lot ${rejectLot.id} ·`).waitFor();
    await section.getByText('2 nonconforming units, reject at 2: decide it now').first().waitFor();
    await screenshot(page, 'today-qa-reject-number');
  } finally {
    await browser.close();
  }
});
