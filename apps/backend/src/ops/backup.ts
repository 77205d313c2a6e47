import { resolve } from 'node:path';
import { loadConfig } from '../config/env';
import { parseArgs } from './args';
import { backupDatabase, copyFolder } from './sqlite-backup';

/**
 * npm run backup -- --to FILE
 * Copies the live SQLite database to FILE (safe while the server runs) and the uploads
 * folder to FILE.uploads beside it.
 */
async function main() {
  const args = parseArgs(process.argv.slice(2));
  if (!args.to) {
    console.error('usage: npm run backup -- --to FILE');
    process.exit(2);
  }
  const config = loadConfig();
  if (config.dbUrl) {
    console.error('DB_URL is set: back up PostgreSQL with pg_dump; this tool copies SQLite.');
    process.exit(2);
  }
  const target = resolve(process.env.INIT_CWD ?? process.cwd(), args.to);
  const started = Date.now();
  await backupDatabase(config.dbPath, target);
  copyFolder(config.uploadDir, `${target}.uploads`);
  console.log(`backup: ${config.dbPath} -> ${target} (${Date.now() - started} ms)`);
  console.log(`backup: ${config.uploadDir} -> ${target}.uploads`);
}

main().catch((e: Error) => {
  console.error(`backup failed: ${e.message}`);
  process.exit(1);
});
