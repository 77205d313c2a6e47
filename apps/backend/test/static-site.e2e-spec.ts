import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

// The server as it runs in production: the built client served beside the API. The other
// suites run with or without apps/frontend/dist, whichever the checkout has; this one
// always has a client folder of its own.
let t: TestApp;
let site: string;
beforeAll(async () => {
  site = mkdtempSync(join(tmpdir(), 'gp-site-'));
  writeFileSync(join(site, 'index.html'), '<!doctype html><title>Gaugeproof test client</title>');
  writeFileSync(join(site, 'sw.js'), 'self.addEventListener("fetch", () => {});');
  mkdirSync(join(site, 'assets'));
  writeFileSync(join(site, 'assets', 'lot-DF2BGZlf.js'), 'export const lot = 1;');
  writeFileSync(join(site, 'assets', 'notes.js'), 'export const notes = 1;');
  t = await startTestApp({}, { frontendDist: site });
});
afterAll(async () => {
  await t.close();
  rmSync(site, { recursive: true, force: true });
});

describe('the built client beside the API', () => {
  it('serves the client for screens and a JSON 404 for unknown API paths', async () => {
    for (const path of ['/', '/lots/12']) {
      const page = await t.http.get(path);
      expect(page.status, path).toBe(200);
      expect(page.text).toContain('Gaugeproof test client');
    }
    const missing = await t.http.get('/api/no-such-thing');
    expect(missing.status).toBe(404);
    expect(missing.body).toMatchObject({ statusCode: 404, path: '/api/no-such-thing' });
  });

  it('lets the browser keep content-hashed built files for good and checks the rest each time', async () => {
    // A hashed name changes whenever the content does, so a kept copy is never stale; the
    // page, the service worker and any unhashed file must be asked again (RFC 9111 5.2.2).
    const hashed = await t.http.get('/assets/lot-DF2BGZlf.js');
    expect(hashed.status).toBe(200);
    expect(hashed.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    for (const path of ['/assets/notes.js', '/sw.js', '/index.html']) {
      const res = await t.http.get(path);
      expect(res.status, path).toBe(200);
      expect(res.headers['cache-control'], path).toBe('no-cache');
    }
    const screen = await t.http.get('/lots/12');
    expect(screen.headers['cache-control'] ?? '').not.toContain('immutable');
  });

  it('answers 400 with the usual error body for a body that is not JSON, saving nothing', async () => {
    const token = await t.token(DEMO.buyer);
    const res = await t.http
      .post('/api/suppliers')
      .set('authorization', `Bearer ${token}`)
      .set('content-type', 'application/json')
      .send('{"name": "Half a supplier", "code": "HALF",');
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Request body is not valid JSON',
      path: '/api/suppliers',
    });
    expect(res.body.requestId).toBeTruthy();
    const list = await t.http.get('/api/suppliers?q=HALF').set('authorization', `Bearer ${token}`);
    expect(list.body.items).toEqual([]);
  });

  it('answers 413 for a JSON body over the limit and 415 for one in an unknown charset', async () => {
    const token = await t.token(DEMO.buyer);
    const big = await t.http
      .post('/api/suppliers')
      .set('authorization', `Bearer ${token}`)
      .set('content-type', 'application/json')
      .send(JSON.stringify({ name: 'x'.repeat(1_100_000), code: 'BIG' }));
    expect(big.status).toBe(413);
    expect(big.body).toMatchObject({ statusCode: 413, message: 'Request body is too large' });
    const odd = await t.http
      .post('/api/suppliers')
      .set('authorization', `Bearer ${token}`)
      .set('content-type', 'application/json; charset=klingon')
      .send('{}');
    expect(odd.status).toBe(415);
    expect(odd.body.requestId).toBeTruthy();
  });

  it('still reads a good JSON body', async () => {
    const res = await t.http
      .post('/api/suppliers')
      .set('authorization', `Bearer ${await t.token(DEMO.buyer)}`)
      .send({ name: 'Static Site Test Cable', code: 'SST-1', contactEmail: 'q@sst.example' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  });
});
