import type { Options } from '@mikro-orm/core';
import type { AppConfig } from '../config/env';
import { sqliteOptions } from './mikro-orm.config';

/** The ORM options for this configuration: SQLite by default. */
export function ormOptions(config: AppConfig): Options {
  if (config.dbUrl) {
    throw new Error('DB_URL (PostgreSQL) is not supported yet; unset it to use SQLite');
  }
  return sqliteOptions(config.dbPath);
}
