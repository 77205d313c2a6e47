// Development: the libraries and the server rebuilt on change, Vite with hot reload on :5173.
import { spawn } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const env = { ...process.env, APP_ORIGINS: process.env.APP_ORIGINS || 'http://localhost:5173' };
const procs = [
  ['npx', ['tsc', '-b', 'libs/standards', 'libs/api-types', '-w', '--preserveWatchOutput']],
  ['npx', ['tsc', '-b', 'apps/backend/tsconfig.build.json', '-w', '--preserveWatchOutput']],
  [
    process.execPath,
    [
      '--watch-path=apps/backend/dist',
      '--watch-path=libs/standards/dist',
      '--watch-path=libs/api-types/dist',
      'apps/backend/dist/main.js',
    ],
  ],
  ['npm', ['run', 'dev', '-w', 'apps/frontend']],
].map(([cmd, args]) => spawn(cmd, args, { cwd: root, env, stdio: 'inherit' }));
const stop = () => procs.forEach((p) => p.kill('SIGTERM'));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
