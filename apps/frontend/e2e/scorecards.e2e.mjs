import assert from 'node:assert/strict';
import { test } from 'node:test';
import { browserForFile, screenshot, signIn, url } from './browser.mjs';

// Sign-in is throttled per address (5 a minute) and the other files sign in too: wait
// out the window once if the server says so.
async function signInPatiently(page, email) {
  for (let attempt = 0; attempt < 2; attempt++) {
    await signIn(page, email);
    const outcome = await Promise.race([
      page.waitForURL((u) => u.pathname !== '/sign-in', { timeout: 15_000 }).then(() => 'in'),
      page
        .getByText('Too many sign-in attempts', { exact: false })
        .waitFor({ timeout: 15_000 })
        .then(() => 'throttled'),
    ]);
    if (outcome === 'in') return;
    await new Promise((r) => setTimeout(r, 61_000));
    await page.goto(url('/sign-in'));
  }
  throw new Error(`could not sign in as ${email}`);
}

let page;
browserForFile(async (p) => {
  page = p;
  // x-charts honours reduced motion: charts are drawn without animation for screenshots.
  await page.emulateMedia({ reducedMotion: 'reduce' });
});

const CHARTS = [
  'Acceptance rate by month',
  'Area-ratio distribution',
  'Nonconforming samples by conductor purpose',
];

test(
  'a buyer opens scorecards from Today, changes the range and opens a supplier',
  { timeout: 180_000 },
  async () => {
    await page.goto(url('/'));
    await signInPatiently(page, 'buyer@demo.example');
    // A buyer lands on Today (its rejected lots without a return); Scorecards are one click on.
    await page.waitForURL((u) => u.pathname === '/today');
    await page.getByRole('region', { name: 'Rejected, not yet returned' }).waitFor();
    await page
      .getByTestId('side-nav')
      .filter({ visible: true })
      .getByRole('link', { name: 'Scorecards' })
      .click();
    await page.waitForURL((u) => u.pathname === '/scorecards');
    await page.getByRole('heading', { level: 1, name: 'Scorecards' }).waitFor();

    const table = page.getByRole('table', { name: 'Supplier ranking' });
    await table.waitFor();
    const firstSupplier = table.getByRole('link').first();
    await firstSupplier.waitFor();
    const headers = await table.getByRole('columnheader').allTextContents();
    for (const h of ['Supplier', 'Lots', 'Accepted', 'Trend', 'Nonconf. units ppm', 'Mean area']) {
      assert.ok(headers.includes(h), `ranking lacks the ${h} column (has ${headers.join(', ')})`);
    }
    // The demo supplier charged back in two currencies: one line each, never one sum.
    await table.getByText('EUR 253.00', { exact: true }).waitFor();
    await table.getByText('USD 317.00', { exact: true }).waitFor();
    assert.equal(await table.getByText('570.00').count(), 0, 'EUR and USD added together');
    await screenshot(page, 'scorecards-ranking');

    // The whole ranking fits a 1366 × 768 screen: no sideways scroll of the page nor of the
    // table's own box, every column header in view (issue 15).
    await page.setViewportSize({ width: 1366, height: 768 });
    await page.waitForFunction(() => globalThis.innerWidth === 1366);
    const fit = await table.evaluate((el) => {
      const box = el.parentElement;
      const right = Math.max(
        ...[...el.querySelectorAll('th')].map((th) => th.getBoundingClientRect().right),
      );
      return {
        page: globalThis.document.documentElement.scrollWidth,
        table: el.scrollWidth,
        box: box.clientWidth,
        right,
      };
    });
    assert.ok(fit.page <= 1366, `the page scrolls sideways (${fit.page} px wide)`);
    assert.ok(fit.table <= fit.box, `the table is ${fit.table} px in a ${fit.box} px box`);
    assert.ok(fit.right <= 1366, `the last column ends at ${fit.right} px`);
    await screenshot(page, 'scorecards-ranking-1366');
    await page.setViewportSize({ width: 1280, height: 800 });

    // A preset, then a typed start date: both land in the address and the figures reload.
    await page.getByRole('button', { name: 'Last 3 months' }).click();
    await page.waitForURL((u) => u.searchParams.has('from'));
    const presetFrom = new URL(page.url()).searchParams.get('from');
    const pressed = (label) => page.locator('button[aria-pressed="true"]', { hasText: label });
    await pressed('Last 3 months').waitFor();
    const typedFrom = `${Number(presetFrom.slice(0, 4)) - 1}${presetFrom.slice(4)}`;
    await page.getByLabel('Received from').fill(typedFrom);
    await page.waitForURL((u) => u.searchParams.get('from') === typedFrom);
    await pressed('Last 3 months').waitFor({ state: 'detached' });

    const name = (await firstSupplier.textContent()).trim();
    await firstSupplier.click();
    await page.waitForURL((u) => /^\/scorecards\/\d+$/.test(u.pathname));
    assert.equal(new URL(page.url()).searchParams.get('from'), typedFrom, 'the range follows');
    await page.getByRole('heading', { level: 1, name }).waitFor();
    await page.getByText('Safety caution').waitFor();
    for (const title of [...CHARTS, 'Worst lots', 'Inspection severity']) {
      await page.getByRole('region', { name: title }).waitFor();
    }
    // Each chart card ends in a drawn chart or its empty-state sentence, never a spinner.
    for (const title of CHARTS) {
      const region = page.getByRole('region', { name: title });
      await region.locator('svg, p').last().waitFor();
      assert.equal(await region.getByLabel(`Loading ${title}`).count(), 0);
    }
    assert.equal(await page.getByRole('alert').filter({ hasText: 'could not' }).count(), 0);
    await page.getByRole('button', { name: 'Download CSV' }).waitFor();
    await screenshot(page, 'scorecard-supplier');
  },
);
