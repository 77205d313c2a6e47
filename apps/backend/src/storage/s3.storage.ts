import { NotFoundException } from '@nestjs/common';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { Readable } from 'node:stream';
import { STORAGE_KEY, StorageService } from './storage.service';

export interface S3StorageOptions {
  bucket: string;
  region: string;
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  forcePathStyle: boolean;
}

/**
 * Files in one S3 bucket, so several app servers can share the photo store. A put is a
 * single PutObject: S3 makes an object visible only once it is complete, so readers never
 * see half a file and a failed upload leaves nothing.
 */
export class S3Storage extends StorageService {
  private readonly client: S3Client;

  constructor(private readonly options: S3StorageOptions) {
    super();
    this.client = new S3Client({
      region: options.region,
      endpoint: options.endpoint,
      forcePathStyle: options.forcePathStyle,
      credentials:
        options.accessKeyId && options.secretAccessKey
          ? { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey }
          : undefined,
    });
  }

  private check(key: string): string {
    if (!STORAGE_KEY.test(key) || key.includes('..')) {
      throw new Error(`Refusing storage key "${key}"`);
    }
    return key;
  }

  async put(key: string, data: Buffer | Readable): Promise<void> {
    // A stream of unknown length would need a multipart upload; photos are bounded (15 MB).
    const body = Buffer.isBuffer(data) ? data : await toBuffer(data);
    await this.client.send(
      new PutObjectCommand({ Bucket: this.options.bucket, Key: this.check(key), Body: body }),
    );
  }

  async get(key: string): Promise<Readable> {
    try {
      const out = await this.client.send(
        new GetObjectCommand({ Bucket: this.options.bucket, Key: this.check(key) }),
      );
      return out.Body as Readable;
    } catch (e) {
      if (e instanceof NoSuchKey || (e as { name?: string }).name === 'NoSuchKey') {
        throw new NotFoundException('The stored file is missing');
      }
      throw e;
    }
  }

  async delete(key: string): Promise<void> {
    await this.client.send(
      new DeleteObjectCommand({ Bucket: this.options.bucket, Key: this.check(key) }),
    );
  }

  close(): void {
    this.client.destroy();
  }
}

async function toBuffer(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}
