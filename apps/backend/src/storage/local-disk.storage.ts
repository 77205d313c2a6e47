import { NotFoundException } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import type { Readable } from 'node:stream';
import { STORAGE_KEY, StorageService } from './storage.service';

/**
 * Files under UPLOAD_DIR. A put writes a temporary file in the destination folder and
 * renames it into place (a rename within one file system is atomic), removing the
 * temporary file if anything fails.
 */
export class LocalDiskStorage extends StorageService {
  constructor(private readonly root: string) {
    super();
  }

  private pathOf(key: string): string {
    const full = resolve(this.root, key);
    if (
      !STORAGE_KEY.test(key) ||
      key.includes('..') ||
      !full.startsWith(resolve(this.root) + sep)
    ) {
      throw new Error(`Refusing storage key "${key}"`);
    }
    return full;
  }

  async put(key: string, data: Buffer | Readable): Promise<void> {
    const target = this.pathOf(key);
    await mkdir(dirname(target), { recursive: true });
    const temp = join(dirname(target), `.${randomUUID()}.tmp`);
    try {
      await writeFile(temp, data, { flag: 'wx', mode: 0o640 });
      await rename(temp, target);
    } catch (e) {
      await rm(temp, { force: true });
      throw e;
    }
  }

  async get(key: string): Promise<Readable> {
    const path = this.pathOf(key);
    try {
      await stat(path);
    } catch {
      throw new NotFoundException('The stored file is missing');
    }
    return createReadStream(path);
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }
}
