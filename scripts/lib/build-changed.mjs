// Builds only the parts whose sources changed since their last build, the way make does:
// a part is stale when its build output is missing or older than one of its input files.
// Used by `npm start` (a start with nothing changed builds nothing) and the test scripts.
import { spawn } from 'node:child_process';
import { readdirSync, statSync, utimesSync } from 'node:fs';
import { join } from 'node:path';

const SKIP_DIRS = new Set(['node_modules', 'dist', 'test-output', '.tmp', 'coverage']);
const TEST_FILE = /\.(spec|test)\.[cm]?[jt]sx?$/;

/** The product's parts in build order; `after` names the parts a part is built after. */
export const PARTS = [
  {
    name: 'standards',
    inputs: ['libs/standards/src', 'libs/standards/package.json', 'libs/standards/tsconfig.json'],
    marker: 'libs/standards/tsconfig.tsbuildinfo',
    command: ['npm', 'run', 'build', '-w', 'libs/standards'],
    after: [],
  },
  {
    name: 'api-types',
    inputs: ['libs/api-types/src', 'libs/api-types/package.json', 'libs/api-types/tsconfig.json'],
    marker: 'libs/api-types/tsconfig.tsbuildinfo',
    command: ['npm', 'run', 'build', '-w', 'libs/api-types'],
    // The contract takes the computation's own enums from the standards library.
    after: ['standards'],
  },
  {
    name: 'client',
    inputs: [
      'apps/frontend/src',
      'apps/frontend/public',
      'apps/frontend/index.html',
      'apps/frontend/package.json',
      'apps/frontend/tsconfig.json',
      'apps/frontend/vite.config.ts',
      'libs/standards/src',
      'libs/api-types/src',
      'package-lock.json',
    ],
    marker: 'apps/frontend/dist/index.html',
    command: ['npm', 'run', 'build', '-w', 'apps/frontend'],
    after: ['standards', 'api-types'],
  },
  {
    name: 'server',
    inputs: [
      'apps/backend/src',
      'apps/backend/package.json',
      'apps/backend/tsconfig.json',
      'apps/backend/tsconfig.build.json',
      'libs/standards/src',
      'libs/standards/package.json',
      'libs/api-types/src',
      'libs/api-types/package.json',
      'package-lock.json',
    ],
    marker: 'apps/backend/dist/.tsbuildinfo',
    command: ['npm', 'run', 'build', '-w', 'apps/backend'],
    after: ['standards', 'api-types'],
  },
];

function mtimeOrNull(path) {
  try {
    return statSync(path).mtimeMs;
  } catch {
    return null;
  }
}

/** The newest modification time among the files under `path` (a file or a folder). */
function newestInput(path) {
  let st;
  try {
    st = statSync(path);
  } catch {
    return 0; // an optional input that does not exist
  }
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs; // a deleted file changes its folder's time
  for (const entry of readdirSync(path, { withFileTypes: true })) {
    if (entry.isDirectory() && SKIP_DIRS.has(entry.name)) continue;
    if (entry.isFile() && TEST_FILE.test(entry.name)) continue;
    newest = Math.max(newest, newestInput(join(path, entry.name)));
  }
  return newest;
}

/** Why `part` must be built, or null when its output is newer than every input. */
export function staleReason(root, part) {
  const built = mtimeOrNull(join(root, part.marker));
  if (built === null) return 'never built';
  for (const input of part.inputs) {
    if (newestInput(join(root, input)) > built) return `${input} changed`;
  }
  return null;
}

function run(root, command, env) {
  return new Promise((resolve) => {
    const started = Date.now();
    const child = spawn(command[0], command.slice(1), {
      cwd: root,
      env,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (d) => (output += d));
    child.stderr.on('data', (d) => (output += d));
    child.on('error', (e) => resolve({ ok: false, output: String(e), ms: Date.now() - started }));
    child.on('close', (code) => resolve({ ok: code === 0, output, ms: Date.now() - started }));
  });
}

/**
 * Builds the stale parts (independent parts at the same time) and returns what happened to
 * each: `{ name, built: boolean, reason, ms }`. Throws, with the build's output, when a
 * build fails. `log` receives one short line per part built.
 */
export async function buildChanged(
  root,
  { parts = PARTS, log = () => {}, env = process.env } = {},
) {
  const results = new Map();
  const rebuilt = new Set();
  const pending = [...parts];
  while (pending.length > 0) {
    const ready = pending.filter((p) => p.after.every((a) => results.has(a)));
    if (ready.length === 0) throw new Error('build parts depend on each other in a circle');
    for (const p of ready) pending.splice(pending.indexOf(p), 1);
    await Promise.all(
      ready.map(async (part) => {
        const reason = part.after.some((a) => rebuilt.has(a))
          ? `${part.after.find((a) => rebuilt.has(a))} was rebuilt`
          : staleReason(root, part);
        if (reason === null) {
          results.set(part.name, { name: part.name, built: false, reason: 'up to date', ms: 0 });
          return;
        }
        log(`building ${part.name} (${reason}) …`);
        const { ok, output, ms } = await run(root, part.command, env);
        if (!ok) {
          const err = new Error(`building ${part.name} failed:\n${output}`);
          err.part = part.name;
          throw err;
        }
        // The tools may leave their output's time alone when they judge it current; the
        // marker must not be older than the inputs just built (nor than a clock-skewed one).
        // (A time read back from the disk can lie a fraction of a millisecond above the
        // whole millisecond it was set to: round up and add one.)
        const stamp = new Date(
          Math.ceil(Math.max(Date.now(), ...part.inputs.map((i) => newestInput(join(root, i))))) +
            1,
        );
        utimesSync(join(root, part.marker), stamp, stamp);
        rebuilt.add(part.name);
        log(`built ${part.name} in ${(ms / 1000).toFixed(1)} s`);
        results.set(part.name, { name: part.name, built: true, reason, ms });
      }),
    );
  }
  return parts.map((p) => results.get(p.name));
}
