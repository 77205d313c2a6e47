import { Global, Module } from '@nestjs/common';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { LocalDiskStorage } from './local-disk.storage';
import { S3Storage } from './s3.storage';
import { StorageService } from './storage.service';

/** File storage for uploads: local disk under UPLOAD_DIR, or an S3 bucket when S3_BUCKET is set. */
@Global()
@Module({
  providers: [
    {
      provide: StorageService,
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) =>
        config.storage.kind === 's3'
          ? new S3Storage(config.storage)
          : new LocalDiskStorage(config.uploadDir),
    },
  ],
  exports: [StorageService],
})
export class StorageModule {}
