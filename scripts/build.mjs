// Builds the parts whose sources changed since their last build (library, client, server);
// `npm run build` builds everything regardless. Used by `npm test` and `npm run test:e2e`.
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildChanged } from './lib/build-changed.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
try {
  const results = await buildChanged(root, { log: (line) => console.log(line) });
  if (results.every((r) => !r.built)) console.log('build: nothing changed since the last build');
} catch (e) {
  console.error(e.message);
  process.exit(1);
}
