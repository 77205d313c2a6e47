import { Global, Module } from '@nestjs/common';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { LocalDiskStorage } from './local-disk.storage';
import { StorageService } from './storage.service';

/** File storage for uploads; local disk under UPLOAD_DIR. */
@Global()
@Module({
  providers: [
    {
      provide: StorageService,
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => new LocalDiskStorage(config.uploadDir),
    },
  ],
  exports: [StorageService],
})
export class StorageModule {}
