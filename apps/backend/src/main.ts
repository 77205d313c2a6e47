import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/core';
import { ConfigError, loadConfig, type AppConfig } from './config/env';
import { createApp } from './app.factory';
import { DEMO_PASSWORD, demoAccountsPresent } from './seed/seed-users';

/** What `scripts/start.mjs` prints in its banner once the server answers. */
export interface ReadyMessage {
  type: 'gaugeproof:ready';
  url: string;
  host: string;
  port: number;
  publicUrl: string;
  database: string;
  photos: string;
  demoAccounts: { email: string; role: string }[];
  demoPassword: string | null;
}

function browsableUrl(config: AppConfig): string {
  const wildcard = config.host === '0.0.0.0' || config.host === '::';
  const host = wildcard
    ? 'localhost'
    : config.host.includes(':')
      ? `[${config.host}]`
      : config.host;
  return `http://${host}:${config.port}`;
}

async function main() {
  let config;
  try {
    config = loadConfig();
  } catch (e) {
    if (e instanceof ConfigError) {
      console.error(e.message);
      process.exit(2);
    }
    throw e;
  }
  const app = await createApp(config);
  await app.listen(config.port, config.host);
  const url = browsableUrl(config);
  const database = config.dbUrl ? 'PostgreSQL (DB_URL)' : config.dbPath;
  const photos =
    config.storage.kind === 's3' ? `S3 bucket ${config.storage.bucket}` : config.uploadDir;
  if (process.send) {
    const demoAccounts = await demoAccountsPresent(app.get(MikroORM).em.fork());
    const ready: ReadyMessage = {
      type: 'gaugeproof:ready',
      url,
      host: config.host,
      port: config.port,
      publicUrl: config.publicUrl,
      database,
      photos,
      demoAccounts,
      demoPassword: demoAccounts.length > 0 ? DEMO_PASSWORD : null,
    };
    process.send(ready);
  } else {
    console.log(`Gaugeproof is serving ${url} (database ${database}, photos ${photos})`);
  }
}

void main();
