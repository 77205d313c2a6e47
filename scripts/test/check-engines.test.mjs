// The engines rule of `npm run lint` (scripts/check-engines.mjs) on a scratch install.
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, test } from 'node:test';
import { checkEngines } from '../check-engines.mjs';

const root = mkdtempSync(join(tmpdir(), 'gp-engines-'));
after(() => rmSync(root, { recursive: true, force: true }));

function write(rel, json) {
  mkdirSync(join(root, rel, '..'), { recursive: true });
  writeFileSync(join(root, rel), JSON.stringify(json));
}

function install(packages) {
  write('package.json', { name: 'shop', engines: { node: '^20.19.0' } });
  const lock = { packages: { '': { name: 'shop' } } };
  for (const [path, { installed = true, optional = false, ...manifest }] of Object.entries(
    packages,
  )) {
    lock.packages[path] = { version: manifest.version, engines: manifest.engines, optional };
    if (installed) write(`${path}/package.json`, manifest);
  }
  write('package-lock.json', lock);
}

test('packages that run on all of the declared range pass', () => {
  install({
    'node_modules/a': { name: 'a', version: '1.0.0', engines: { node: '>=18' } },
    'node_modules/b': {
      name: 'b',
      version: '1.0.0',
      engines: { node: '^18.18.0 || ^20.9.0 || >=21.1.0' },
    },
    'node_modules/c': { name: 'c', version: '1.0.0' },
    // another platform's binary, not installed here
    'node_modules/d-win32': {
      name: 'd-win32',
      version: '1.0.0',
      engines: { node: '>=99' },
      installed: false,
      optional: true,
    },
  });
  assert.deepEqual(checkEngines(root), { projectRange: '^20.19.0', checked: 3, problems: [] });
});

test('a nested package that needs a newer Node fails, named with its path', () => {
  install({
    'node_modules/a': { name: 'a', version: '1.0.0', engines: { node: '>=18' } },
    'node_modules/a/node_modules/cookie': {
      name: 'cookie',
      version: '2.0.2',
      engines: { node: '>=22' },
    },
    'node_modules/e': { name: 'e', version: '1.0.0', engines: { node: '^20.19.0 || >=22.12.0' } },
    'node_modules/f': { name: 'f', version: '1.0.0', engines: { node: '^20.20.0' } },
  });
  const { problems } = checkEngines(root);
  assert.deepEqual(problems, [
    'node_modules/a/node_modules/cookie: cookie@2.0.2 needs Node ">=22", the project declares "^20.19.0"',
    'node_modules/f: f@1.0.0 needs Node "^20.20.0", the project declares "^20.19.0"',
  ]);
  const cli = join(import.meta.dirname, '..', 'check-engines.mjs');
  assert.throws(
    () => execFileSync(process.execPath, [cli, root], { stdio: 'pipe' }),
    (e) => e.status === 1 && /cookie@2\.0\.2 needs Node ">=22"/.test(String(e.stderr)),
  );
});

test('a missing package the lockfile requires is reported', () => {
  install({ 'node_modules/g': { name: 'g', version: '1.0.0', installed: false } });
  assert.deepEqual(checkEngines(root).problems, [
    'node_modules/g: in the lockfile but not installed (run npm ci)',
  ]);
});

test('this repository passes', () => {
  const repo = join(import.meta.dirname, '..', '..');
  const { problems, checked } = checkEngines(repo);
  assert.deepEqual(problems, []);
  assert.ok(checked > 100, `checked ${checked} packages`);
});
