import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { loadConfig } from '../config/env';
import { parseArgs } from './args';
import { copyFolder, restoreDatabase } from './sqlite-backup';

/**
 * npm run restore -- --from FILE
 * Refuses while any server runs on the database (it says how to stop them). Puts the backup FILE in place of DB_PATH and FILE.uploads in
 * place of UPLOAD_DIR.
 */
function main() {
  const args = parseArgs(process.argv.slice(2));
  if (!args.from) {
    console.error('usage: npm run restore -- --from FILE   (stop the server first)');
    process.exit(2);
  }
  const config = loadConfig();
  const from = resolve(process.env.INIT_CWD ?? process.cwd(), args.from);
  if (config.dbUrl) {
    console.error('DB_URL is set: restore PostgreSQL with pg_restore; this tool restores SQLite.');
    process.exit(2);
  }
  restoreDatabase(from, config.dbPath, () => {
    if (existsSync(`${from}.uploads`)) copyFolder(`${from}.uploads`, config.uploadDir);
  });
  console.log(`restore: ${from} -> ${config.dbPath}`);
  console.log(`restore: ${from}.uploads -> ${config.uploadDir}`);
}

try {
  main();
} catch (e) {
  console.error(`restore failed: ${(e as Error).message}`);
  process.exit(1);
}
