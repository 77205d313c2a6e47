import { NotFoundException } from '@nestjs/common';
import { MikroORM } from '@mikro-orm/core';
import { Jimp } from 'jimp';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Photo } from '../src/photos/entities/photo.entity';
import { LocalDiskStorage } from '../src/storage/local-disk.storage';
import { S3Storage } from '../src/storage/s3.storage';
import type { StorageService } from '../src/storage/storage.service';
import { createLot, createProduct } from './helpers/fixtures';
import { startS3Fake } from './helpers/s3-fake';
import { DEMO, startTestApp } from './helpers/test-app';

type Fake = Awaited<ReturnType<typeof startS3Fake>>;
let fake: Fake;
let localDir: string;
beforeAll(async () => {
  fake = await startS3Fake('gaugeproof-test');
  localDir = mkdtempSync(join(tmpdir(), 'gp-local-'));
});
afterAll(async () => {
  await fake.close();
  rmSync(localDir, { recursive: true, force: true });
});

async function read(stream: Readable): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const c of stream) chunks.push(Buffer.from(c as Buffer));
  return Buffer.concat(chunks).toString('utf8');
}

const implementations: [string, () => StorageService][] = [
  ['local disk', () => new LocalDiskStorage(localDir)],
  [
    'S3',
    () =>
      new S3Storage({
        bucket: 'gaugeproof-test',
        region: 'us-east-1',
        endpoint: fake.endpoint,
        accessKeyId: 'S3RVER',
        secretAccessKey: 'S3RVER',
        forcePathStyle: true,
      }),
  ],
];

describe.each(implementations)('%s storage', (_name, make) => {
  it('puts a buffer and a stream, gets them back, deletes them', async () => {
    const s = make();
    await s.put('photos/a.txt', Buffer.from('first'));
    await s.put('photos/b.txt', Readable.from([Buffer.from('sec'), Buffer.from('ond')]));
    expect(await read(await s.get('photos/a.txt'))).toBe('first');
    expect(await read(await s.get('photos/b.txt'))).toBe('second');
    await s.delete('photos/a.txt');
    await s.delete('photos/a.txt'); // already gone: no error
    await expect(s.get('photos/a.txt')).rejects.toBeInstanceOf(NotFoundException);
  });

  it('refuses keys that could climb out of the store', async () => {
    const s = make();
    for (const key of ['../escape.txt', 'photos/../../x', '/abs', '', 'a b']) {
      await expect(s.put(key, Buffer.from('x')), key).rejects.toThrow(/Refusing storage key/);
    }
  });
});

describe('photos on S3 through the app', () => {
  it('stores an uploaded photo in the bucket, not on the local disk, and serves it', async () => {
    const t = await startTestApp(fake.env);
    try {
      const lotId = await createLot(t, await createProduct(t));
      const png = await new Jimp({ width: 64, height: 48, color: 0x884422ff }).getBuffer(
        'image/png',
      );
      const res = await t.http
        .post(`/api/lots/${lotId}/photos`)
        .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
        .attach('file', png, { filename: 'cut-end.png', contentType: 'image/png' });
      expect(res.status).toBe(201);
      const photo = await t.app.get(MikroORM).em.fork().findOneOrFail(Photo, { id: res.body.id });
      const inBucket = readdirSync(fake.dir, { recursive: true }).map(String);
      expect(inBucket.some((f) => f.includes(photo.storageKey.split('/').pop()!))).toBe(true);
      expect(existsSync(t.config.uploadDir) ? readdirSync(t.config.uploadDir) : []).toEqual([]);
      const back = await t.http
        .get(res.body.url as string)
        .set('Authorization', `Bearer ${await t.token(DEMO.qa)}`)
        .buffer(true)
        .parse((r, cb) => {
          const parts: Buffer[] = [];
          r.on('data', (c: Buffer) => parts.push(c));
          r.on('end', () => cb(null, Buffer.concat(parts)));
        });
      expect(back.status).toBe(200);
      expect(Buffer.compare(back.body as Buffer, png)).toBe(0);
    } finally {
      await t.close();
    }
  });
});
