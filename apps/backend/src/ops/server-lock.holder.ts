import { Inject, Injectable, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { holdServerLock, type ServerLock } from './server-lock';

/** Holds the SQLite database's server lock from start to shutdown (`npm run restore` waits). */
@Injectable()
export class ServerLockHolder implements OnModuleInit, OnApplicationShutdown {
  private lock: ServerLock | null = null;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  onModuleInit() {
    if (!this.config.dbUrl) this.lock = holdServerLock(this.config.dbPath);
  }

  onApplicationShutdown() {
    this.lock?.release();
    this.lock = null;
  }
}
