// The client's figures: gzip size of the JavaScript the first screen loads, and the time
// until the Lot page shows its readings in headless Chromium.
import { mkdtemp, rm } from 'node:fs/promises';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';

const DIST = join(import.meta.dirname, '..', '..', 'apps/frontend/dist');

/** Static `import … from "./x.js"` and `import "./x.js"` of a built chunk (not `import()`). */
function staticImports(code) {
  const found = [];
  const re = /(?:^|[;\s}])(?:import|export)\s*(?:[\w$*{}\s,]+from\s*)?["']([^"']+\.js)["']/g;
  for (const m of code.matchAll(re)) found.push(m[1]);
  return found;
}

/**
 * Every script index.html loads (module entry and module preloads) and, recursively, their
 * static imports: what the browser must fetch before the first screen runs. Gzip level 6,
 * as servers compress by default.
 */
export function firstScreenJs() {
  const html = readFileSync(join(DIST, 'index.html'), 'utf8');
  const queue = [
    ...[...html.matchAll(/<script[^>]*type="module"[^>]*src="([^"]+)"/g)].map((m) => m[1]),
    ...[...html.matchAll(/<link[^>]*rel="modulepreload"[^>]*href="([^"]+)"/g)].map((m) => m[1]),
  ].map((p) => p.replace(/^\//, ''));
  const seen = new Set();
  let gzipBytes = 0;
  let rawBytes = 0;
  while (queue.length) {
    const file = queue.shift();
    if (seen.has(file)) continue;
    seen.add(file);
    const code = readFileSync(join(DIST, file));
    rawBytes += code.length;
    gzipBytes += gzipSync(code, { level: 6 }).length;
    const dir = file.includes('/') ? file.slice(0, file.lastIndexOf('/') + 1) : '';
    for (const spec of staticImports(code.toString('utf8'))) {
      queue.push(
        spec.startsWith('/') ? spec.slice(1) : new URL(spec, `http://x/${dir}`).pathname.slice(1),
      );
    }
  }
  return { files: [...seen], gzipKb: gzipBytes / 1000, rawKb: rawBytes / 1000 };
}

/** Browser flags as in apps/frontend/e2e/browser.mjs. */
async function launch() {
  const dir = await mkdtemp(join(tmpdir(), 'gp-bench-chromium-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1280, height: 800 },
    args: [
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
    close: async () => (await context.close(), await rm(dir, { recursive: true, force: true })),
  };
}

/** A server of one blank page, for the browser's own cost of opening a page. */
async function blankServer() {
  const server = createServer((req, res) => {
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
    res.end('<!doctype html><html><head><title>blank</title></head><body></body></html>');
  });
  await new Promise((resolve) => server.listen(0, '127.0.0.1', resolve));
  return { url: `http://127.0.0.1:${server.address().port}/`, close: () => server.close() };
}

/**
 * Signs in through the form once, then loads /lots/:id `loads` times in a new tab each
 * and times from navigation start until a row of a Readings table is visible; then, in
 * the same browser, the time until a blank page has loaded (`blank`), so the Lot page can
 * be read as a multiple of what the browser costs on this machine at this moment.
 */
export async function lotPageReady(base, lotId, email, password, loads) {
  const browser = await launch();
  const blank = await blankServer();
  try {
    const page = await browser.context.newPage();
    await page.goto(`${base}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'), { timeout: 30_000 });
    await page.close();
    const times = [];
    const blanks = [];
    for (let i = 0; i < loads; i++) {
      const tab = await browser.context.newPage();
      const t0 = performance.now();
      await tab.goto(`${base}/lots/${lotId}`, { waitUntil: 'commit' });
      await tab
        .getByRole('table', { name: 'Readings' })
        .first()
        .locator('tbody tr')
        .first()
        .waitFor({ state: 'visible', timeout: 30_000 });
      times.push(performance.now() - t0);
      await tab.close();
      const other = await browser.context.newPage();
      const b0 = performance.now();
      await other.goto(blank.url, { waitUntil: 'load' });
      blanks.push(performance.now() - b0);
      await other.close();
    }
    return { times, blanks };
  } finally {
    blank.close();
    await browser.close();
  }
}
