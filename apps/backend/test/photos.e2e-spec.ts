import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync } from 'node:fs';
import { Jimp } from 'jimp';
import { MikroORM } from '@mikro-orm/core';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Lot } from '../src/lots/entities/lot.entity';
import { Photo } from '../src/photos/entities/photo.entity';
import { as, createLot, createProduct } from './helpers/fixtures';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let lotId: number;
let png: Buffer;
let jpeg: Buffer;
beforeAll(async () => {
  t = await startTestApp();
  lotId = await createLot(t, await createProduct(t));
  // Drawn here: a plain blue field with a lighter band, no outside image.
  const image = new Jimp({ width: 800, height: 600, color: 0x2255aaff });
  image.scan(0, 250, 800, 100, (_x, _y, idx) => {
    image.bitmap.data.writeUInt32BE(0x99bbeeff, idx);
  });
  png = await image.getBuffer('image/png');
  jpeg = await image.getBuffer('image/jpeg', { quality: 85 });
});
afterAll(async () => t.close());

const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const photoCount = () => t.app.get(MikroORM).em.fork().count(Photo);
function uploads(): string[] {
  const dir = t.config.uploadDir;
  return existsSync(dir)
    ? readdirSync(dir, { recursive: true, withFileTypes: true })
        .filter((d) => d.isFile())
        .map((d) => d.name)
    : [];
}

async function upload(
  who: string,
  data: Buffer,
  filename: string,
  fields: Record<string, string> = {},
) {
  let req = t.http
    .post(`/api/lots/${lotId}/photos`)
    .set('Authorization', `Bearer ${await t.token(who)}`)
    .attach('file', data, { filename, contentType: 'image/png' });
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req;
}

/** PNG signature and an IHDR chunk claiming `w` × `h`, then junk: never a decodable image. */
function pngClaiming(w: number, h: number): Buffer {
  const ihdr = Buffer.alloc(25);
  ihdr.writeUInt32BE(13, 0);
  ihdr.write('IHDR', 4, 'latin1');
  ihdr.writeUInt32BE(w, 8);
  ihdr.writeUInt32BE(h, 12);
  ihdr.set([8, 6, 0, 0, 0], 16);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    ihdr,
    Buffer.alloc(200, 7),
  ]);
}

describe('photo upload', () => {
  it('stores a PNG and a JPEG with generated names; both round-trip with matching sha256', async () => {
    for (const [data, name, type] of [
      [png, 'my cable.png', 'image/png'],
      [jpeg, '../../etc/passwd.jpg', 'image/jpeg'],
    ] as const) {
      const res = await upload(DEMO.clerk, data, name, { caption: 'Cut end, power conductor' });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      expect(res.body).toMatchObject({
        url: `/api/photos/${res.body.id}/original`,
        thumbnailUrl: `/api/photos/${res.body.id}/thumbnail`,
        sha256: sha(data),
        mimeType: type,
        width: 800,
        height: 600,
        caption: 'Cut end, power conductor',
      });
      const original = await t.http
        .get(res.body.url)
        .set('Authorization', `Bearer ${await t.token(DEMO.buyer)}`)
        .buffer(true)
        .parse((r, cb) => {
          const chunks: Buffer[] = [];
          r.on('data', (c: Buffer) => chunks.push(c));
          r.on('end', () => cb(null, Buffer.concat(chunks)));
        });
      expect(original.status).toBe(200);
      expect(original.headers['content-type']).toBe(type);
      expect(original.headers['x-content-type-options']).toBe('nosniff');
      expect(sha(original.body as Buffer)).toBe(sha(data));
      const thumb = await t.http
        .get(res.body.thumbnailUrl)
        .set('Authorization', `Bearer ${await t.token(DEMO.qa)}`)
        .buffer(true)
        .parse((r, cb) => {
          const chunks: Buffer[] = [];
          r.on('data', (c: Buffer) => chunks.push(c));
          r.on('end', () => cb(null, Buffer.concat(chunks)));
        });
      expect(thumb.status).toBe(200);
      expect(thumb.headers['content-type']).toBe(type);
      const small = await Jimp.fromBuffer(thumb.body as Buffer);
      expect([small.bitmap.width, small.bitmap.height]).toEqual([320, 240]);
    }
    const names = uploads();
    expect(names).toHaveLength(4);
    expect(names.every((n) => /^[0-9a-f-]{36}(-thumb)?\.(png|jpg)$/.test(n))).toBe(true);
    const audit = await t.app
      .get(MikroORM)
      .em.fork()
      .count(AuditEvent, { action: 'photo.create', lotId });
    expect(audit).toBe(2);
  });

  it('refuses purchasing, and signed-out readers of the photos', async () => {
    expect((await upload(DEMO.buyer, png, 'a.png')).status).toBe(403);
    expect((await upload(DEMO.admin, png, 'a.png')).status).toBe(201);
    expect((await t.http.get('/api/photos/1/original')).status).toBe(401);
    expect((await t.http.get('/api/photos/1/thumbnail')).status).toBe(401);
  });

  it('refuses a text file renamed .png, an oversize file, a truncated PNG and a huge header, leaving nothing behind', async () => {
    const filesBefore = uploads().sort();
    const rowsBefore = await photoCount();
    const text = await upload(
      DEMO.clerk,
      Buffer.from('just some notes, not a picture\n'),
      'photo.png',
    );
    expect(text.status).toBe(415);
    expect(text.body.message).toMatch(/JPEG, PNG or WebP.*judged by its content/);
    const big = Buffer.concat([png, Buffer.alloc(15 * 1024 * 1024, 1)]);
    const oversize = await upload(DEMO.clerk, big, 'big.png');
    expect(oversize.status).toBe(413);
    expect(oversize.body.message).toMatch(/larger than 15 MB/);
    const truncated = await upload(
      DEMO.clerk,
      png.subarray(0, Math.floor(png.length / 2)),
      'cut.png',
    );
    expect(truncated.status).toBe(422);
    expect(truncated.body.message).toMatch(/truncated or corrupt/);
    const huge = await upload(DEMO.clerk, pngClaiming(20_000, 20_000), 'bomb.png');
    expect(huge.status).toBe(422);
    expect(huge.body.message).toMatch(/20000 × 20000 pixels \(400 megapixels\); at most 40/);
    const none = await t.http
      .post(`/api/lots/${lotId}/photos`)
      .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
      .field('caption', 'forgot the file');
    expect(none.status).toBe(400);
    expect(none.body.message).toEqual(['file is required: attach a JPEG, PNG or WebP photo']);
    const foreign = await upload(DEMO.clerk, png, 'a.png', { sampleId: '999999' });
    expect(foreign.status).toBe(422);
    expect(uploads().sort()).toEqual(filesBefore);
    expect(await photoCount()).toBe(rowsBefore);
  });

  it('answers 404 for an unknown lot or photo', async () => {
    const res = await t.http
      .post('/api/lots/999999/photos')
      .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
      .attach('file', png, 'a.png');
    expect(res.status).toBe(404);
    const get = await as(t, DEMO.clerk, 'get', '/api/photos/999999/original');
    expect(get.status).toBe(404);
  });
});

describe('voiding a photo (never deleted)', () => {
  const REASON = 'Wrong reel: this is the lot beside it';
  const voidAs = (who: string, id: number, reason: unknown = REASON) =>
    as(t, who, 'post', `/api/photos/${id}/void`, { reason });

  it('lets the clerk who took it void it with a reason; the file stays, shown with who, when and why, audited', async () => {
    const taken = await upload(DEMO.clerk, png, 'label.png', { caption: 'Reel label' });
    expect(taken.status).toBe(201);
    const files = uploads().length;

    const short = await voidAs(DEMO.clerk, taken.body.id, 'oops');
    expect(short.status).toBe(400);
    expect(short.body.errors).toEqual([
      { field: 'reason', message: expect.stringContaining('at least 10 characters') },
    ]);

    const res = await voidAs(DEMO.clerk, taken.body.id);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({
      id: taken.body.id,
      voided: true,
      voidReason: REASON,
      voidedBy: { name: expect.any(String) },
      caption: 'Reel label',
    });
    expect(uploads().length).toBe(files);
    expect((await as(t, DEMO.clerk, 'get', `/api/photos/${taken.body.id}/original`)).status).toBe(
      200,
    );

    const lot = await as(t, DEMO.qa, 'get', `/api/lots/${lotId}`);
    const shown = lot.body.photos.find((p: { id: number }) => p.id === taken.body.id);
    expect(shown).toMatchObject({ voided: true, voidReason: REASON, voidedBy: res.body.voidedBy });

    const event = await t.app
      .get(MikroORM)
      .em.fork()
      .findOneOrFail(AuditEvent, { action: 'photo.void', entityId: taken.body.id });
    expect(event).toMatchObject({
      entityType: 'photo',
      lotId,
      actorEmail: DEMO.clerk,
      before: expect.objectContaining({ voided: false }),
      after: expect.objectContaining({ voided: true, voidReason: REASON }),
    });

    const again = await voidAs(DEMO.qa, taken.body.id);
    expect(again.status).toBe(409);
    expect(again.body.message).toContain(REASON);
  });

  it("refuses a clerk another person's photo and purchasing any; the QA lead may void any", async () => {
    const byQa = await upload(DEMO.qa, png, 'reel.png');
    expect(byQa.status).toBe(201);
    expect((await voidAs(DEMO.clerk, byQa.body.id)).status).toBe(403);
    expect((await voidAs(DEMO.buyer, byQa.body.id)).status).toBe(403);
    expect(
      (await t.http.post(`/api/photos/${byQa.body.id}/void`).send({ reason: REASON })).status,
    ).toBe(401);
    const byClerk = await upload(DEMO.clerk, png, 'end.png');
    const res = await voidAs(DEMO.qa, byClerk.body.id);
    expect(res.status).toBe(200);
    expect(res.body.voided).toBe(true);
    expect((await voidAs(DEMO.admin, 999_999)).status).toBe(404);
  });

  it('refuses a clerk once the lot is decided; the QA lead still may', async () => {
    const taken = await upload(DEMO.clerk, png, 'late.png');
    expect(taken.status).toBe(201);
    const em = t.app.get(MikroORM).em.fork();
    const lot = await em.findOneOrFail(Lot, { id: lotId });
    const status = lot.status;
    lot.status = 'accepted';
    await em.flush();
    try {
      const res = await voidAs(DEMO.clerk, taken.body.id);
      expect(res.status).toBe(422);
      expect(res.body.message).toContain('only a QA lead');
      expect((await voidAs(DEMO.qa, taken.body.id)).status).toBe(200);
    } finally {
      lot.status = status;
      await em.flush();
    }
  });
});
