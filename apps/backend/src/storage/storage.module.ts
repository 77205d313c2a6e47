import { Global, Module } from '@nestjs/common';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { LocalDiskStorage } from './local-disk.storage';
import { StorageService } from './storage.service';

/** File storage for uploads: local disk under UPLOAD_DIR, or an S3 bucket when S3_BUCKET is set. */
@Global()
@Module({
  providers: [
    {
      provide: StorageService,
      inject: [APP_CONFIG],
      // The S3 client (about 13 MB resident) is loaded only when the bucket is configured.
      useFactory: async (config: AppConfig) => {
        if (config.storage.kind !== 's3') return new LocalDiskStorage(config.uploadDir);
        const { S3Storage } = await import('./s3.storage.js');
        return new S3Storage(config.storage);
      },
    },
  ],
  exports: [StorageService],
})
export class StorageModule {}
