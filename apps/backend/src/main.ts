import 'reflect-metadata';
import { ConfigError, loadConfig } from './config/env';
import { createApp } from './app.factory';

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
  await app.listen(config.port);
  console.log(`Gaugeproof is serving http://localhost:${config.port}`);
}

void main();
