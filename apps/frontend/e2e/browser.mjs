// Shared helpers for the browser tests: Debian's chromium through playwright-core.
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, beforeEach } from 'node:test';
import { chromium } from 'playwright-core';

export const BASE_URL = process.env.BASE_URL ?? 'http://localhost:3000';
export const SCREENSHOT_DIR =
  process.env.SCREENSHOT_DIR ?? join(process.cwd(), 'test-output/screenshots');
export const DEMO_PASSWORD = 'gaugeproof-demo';

/**
 * A fresh browser profile per launch, removed again by close(). `options` go to
 * playwright's launchPersistentContext (a phone: viewport, hasTouch, isMobile); `args`
 * are added to the usual ones.
 */
export async function launchBrowser({ args = [], ...options } = {}) {
  const freshDir = await mkdtemp(join(tmpdir(), 'gaugeproof-chromium-'));
  const context = await chromium.launchPersistentContext(freshDir, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1280, height: 800 },
    ...options,
    args: [
      ...args,
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    context,
    async close() {
      await context.close();
      await rm(freshDir, { recursive: true, force: true });
    },
  };
}

export const url = (path) => new URL(path, BASE_URL).toString();

/** Fills and sends the sign-in form; starts from the sign-in page unless already on it. */
export async function signIn(page, email, password = DEMO_PASSWORD) {
  if (new URL(page.url(), BASE_URL).pathname !== '/sign-in') {
    await page.goto(url('/sign-in'));
  }
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function screenshot(page, name) {
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

/** Labels of the side navigation, in order. */
export async function navLabels(page) {
  const nav = page.getByTestId('side-nav').filter({ visible: true });
  await nav.first().waitFor();
  return nav.first().locator('.MuiListItemText-primary').allTextContents();
}

/**
 * One browser for the whole test file, through node:test's hooks: `onOpen(page, browser)`
 * gets a page in it before the first test (and, with `pagePerTest`, a new page with
 * no cookies before each test); the browser is closed after the last. Other options go to
 * `launchBrowser`.
 */
export function browserForFile(onOpen, { pagePerTest = false, ...launchOptions } = {}) {
  let browser;
  before(async () => {
    browser = await launchBrowser(launchOptions);
    if (!pagePerTest) await onOpen(await browser.context.newPage(), browser);
  });
  after(async () => {
    await browser?.close();
  });
  if (pagePerTest) {
    beforeEach(async () => {
      await browser.context.clearCookies();
      await onOpen(await browser.context.newPage(), browser);
    });
  }
}

/** Signs in as `email` on the sign-in page that leads on to lot `lotId`, and waits for the lot page. */
export async function signInToLot(page, email, lotId) {
  await page.goto(url(`/sign-in?redirectTo=${encodeURIComponent(`/lots/${lotId}`)}`));
  await signIn(page, email);
  await page.waitForURL((u) => u.pathname === `/lots/${lotId}`);
}
