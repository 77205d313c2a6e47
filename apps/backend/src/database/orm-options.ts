import type { Options } from '@mikro-orm/core';
import type { AppConfig } from '../config/env';
import { postgresOptions } from './postgres.config';
import { sqliteOptions } from './sqlite.config';

/** The ORM options for this configuration: PostgreSQL when DB_URL is set, else SQLite. */
export function ormOptions(config: AppConfig): Options {
  return config.dbUrl ? postgresOptions(config.dbUrl) : sqliteOptions(config.dbPath);
}
