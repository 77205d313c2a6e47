import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deflateSync } from 'node:zlib';
import { threadId } from 'node:worker_threads';
import { Jimp } from 'jimp';
import { MikroORM } from '@mikro-orm/core';
import { Photo } from '../src/photos/entities/photo.entity';
import { DecodePool, DecodePoolBusyError } from '../src/photos/decode-pool';
import { pngLayout } from '../src/photos/image-bounds';
import { createLot, createProduct } from './helpers/fixtures';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

/**
 * Images that cannot blow up (issue 17 item 2): bounds read from the file before decoding,
 * and decoding in worker threads a bounded number at a time.
 */
let t: TestApp;
let lotId: number;
beforeAll(async () => {
  t = await startTestApp();
  lotId = await createLot(t, await createProduct(t));
});
afterAll(async () => t.close());

const photoCount = () => t.app.get(MikroORM).em.fork().count(Photo);

async function upload(data: Buffer, contentType = 'image/png') {
  return t.http
    .post(`/api/lots/${lotId}/photos`)
    .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
    .attach('file', data, { filename: 'photo', contentType });
}

/** CRC-32 of PNG chunks (PNG spec, Annex D, polynomial 0xEDB88320). */
function crc32(b: Buffer): number {
  let c = ~0;
  for (const byte of b) {
    c ^= byte;
    for (let k = 0; k < 8; k++) c = c & 1 ? (c >>> 1) ^ 0xedb88320 : c >>> 1;
  }
  return ~c >>> 0;
}
function chunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])));
  return Buffer.concat([head, data, crc]);
}
/** An 8-bit RGBA PNG of w × h with the given (already filtered) image data. */
function rgbaPng(w: number, h: number, interlaced: boolean, raw: Buffer): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr.set([8, 6, 0, 0, interlaced ? 1 : 0], 8);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(raw)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}
/**
 * The filtered data of an interlaced w × h RGBA image, built pixel by pixel: each Adam7 pass
 * (PNG spec 8.2) lists the pixels it holds, row by row, each row behind a filter byte 0.
 */
function adam7Raw(w: number, h: number): Buffer {
  const passes = [
    [0, 0, 8, 8],
    [4, 0, 8, 8],
    [0, 4, 4, 8],
    [2, 0, 4, 4],
    [0, 2, 2, 4],
    [1, 0, 2, 2],
    [0, 1, 1, 2],
  ];
  const bytes: number[] = [];
  for (const [x0, y0, dx, dy] of passes) {
    for (let y = y0; y < h; y += dy) {
      const row: number[] = [];
      for (let x = x0; x < w; x += dx) row.push(40 * x, 30 * y, 200, 255);
      if (row.length) bytes.push(0, ...row);
    }
  }
  return Buffer.from(bytes);
}

describe('photo bounds before decoding', () => {
  it('refuses a 1 × 1 interlaced PNG whose data inflates to 64 MB, saving nothing', async () => {
    // 64 MiB of zeros deflates to about 64 KB: the whole file is small, the inflation is not.
    const bomb = rgbaPng(1, 1, true, Buffer.alloc(64 * 1024 * 1024));
    expect(bomb.length).toBeLessThan(200_000);
    const before = await photoCount();
    const res = await upload(bomb);
    expect(res.status, JSON.stringify(res.body)).toBe(422);
    expect(res.body.message).toContain('inflates to more than its 1 × 1 pixels need');
    expect(await photoCount()).toBe(before);
  });

  it('refuses the same inflation in a plain (not interlaced) PNG', async () => {
    const res = await upload(rgbaPng(2, 2, false, Buffer.alloc(16 * 1024 * 1024)));
    expect(res.status).toBe(422);
    expect(res.body.message).toContain('inflates to more than its 2 × 2 pixels need');
  });

  it('accepts interlaced PNGs whose data is exactly what their pixels need', async () => {
    for (const [w, h] of [
      [1, 1],
      [5, 3],
      [9, 17],
    ]) {
      const raw = adam7Raw(w, h);
      const file = rgbaPng(w, h, true, raw);
      expect(pngLayout(file).rawBytes).toBe(raw.length);
      const res = await upload(file);
      expect(res.status, `${w}×${h} ${JSON.stringify(res.body)}`).toBe(201);
      expect(res.body).toMatchObject({ width: w, height: h });
    }
  });

  it('refuses a JPEG whose frame asks for more colour components than a photo has', async () => {
    const image = new Jimp({ width: 64, height: 48, color: 0x2255aaff });
    const jpeg = Buffer.from(await image.getBuffer('image/jpeg', { quality: 85 }));
    // Find the baseline frame header (FF C0) and claim 200 components in it.
    const sof = jpeg.indexOf(Buffer.from([0xff, 0xc0]));
    expect(sof).toBeGreaterThan(0);
    jpeg[sof + 9] = 200;
    const res = await upload(jpeg, 'image/jpeg');
    expect(res.status).toBe(422);
    expect(res.body.message).toContain('its frame has 200 colour components');
  });
});

describe('photo decoding off the event loop', () => {
  async function samplePng() {
    const image = new Jimp({ width: 400, height: 300, color: 0x2255aaff });
    return Buffer.from(await image.getBuffer('image/png'));
  }
  const job = (data: Buffer) => ({
    data,
    mimeType: 'image/png' as const,
    png: { rawBytes: pngLayout(data).rawBytes, idat: pngLayout(data).idat },
    thumbnailPx: 320,
    jpegMaxMemoryMb: 512,
  });

  it('decodes in a worker thread, not on the thread that answers requests', async () => {
    const pool = new DecodePool({ size: 1, maxWaiting: 0, timeoutMs: 30_000 });
    try {
      const result = await pool.run(job(await samplePng()));
      expect(result).toMatchObject({ ok: true, width: 400, height: 300 });
      expect(result.threadId).not.toBe(threadId);
      if (!result.ok) throw new Error('decode failed');
      const thumb = await Jimp.fromBuffer(Buffer.from(result.thumbnail));
      expect([thumb.bitmap.width, thumb.bitmap.height]).toEqual([320, 240]);
    } finally {
      await pool.close();
    }
  });

  it('runs at most `size` decodes at once, queues `maxWaiting`, and refuses the next at once', async () => {
    const pool = new DecodePool({ size: 1, maxWaiting: 1, timeoutMs: 30_000 });
    try {
      const data = await samplePng();
      const first = pool.run(job(data));
      const second = pool.run(job(data));
      const third = pool.run(job(data));
      await expect(third).rejects.toBeInstanceOf(DecodePoolBusyError);
      expect(pool.load()).toEqual({ running: 1, waiting: 1 });
      expect((await first).ok).toBe(true);
      expect((await second).ok).toBe(true);
      expect(pool.load()).toEqual({ running: 0, waiting: 0 });
    } finally {
      await pool.close();
    }
  });
});
