// The changed-only build of `npm start`, `npm test` and `npm run test:e2e`, on a scratch
// tree of three parts whose "build" is a small node script that counts its runs.
import assert from 'node:assert/strict';
import {
  existsSync,
  mkdirSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  utimesSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { buildChanged, PARTS, staleReason } from '../lib/build-changed.mjs';

let root;

/** A part whose build appends its name to runs.log and writes its marker. */
function part(name, inputs, after = [], fails = false) {
  const script =
    `require('fs').appendFileSync('runs.log', '${name}\\n');` +
    `require('fs').mkdirSync('${name}/dist', { recursive: true });` +
    `require('fs').writeFileSync('${name}/dist/out', 'x');` +
    (fails ? `console.error('${name}: type error on line 3'); process.exit(1);` : '');
  return {
    name,
    inputs,
    marker: `${name}/dist/out`,
    command: [process.execPath, '-e', script],
    after,
  };
}

const parts = () => [
  part('lib', ['lib/src']),
  part('client', ['client/src', 'lib/src', 'lock.json'], ['lib']),
  part('server', ['server/src', 'lib/src', 'lock.json'], ['lib']),
];

const runs = () =>
  readFileSync(join(root, 'runs.log'), 'utf8').trim().split('\n').filter(Boolean).sort();

/** Moves a file's time forward, as an editor's save does (file times can be coarse). */
function edit(rel) {
  writeFileSync(join(root, rel), `changed ${Date.now()}`);
  const later = new Date(Date.now() + 5_000);
  utimesSync(join(root, rel), later, later);
}

before(() => {
  root = mkdtempSync(join(tmpdir(), 'gp-build-changed-'));
  for (const dir of ['lib/src', 'client/src', 'server/src']) {
    mkdirSync(join(root, dir), { recursive: true });
    writeFileSync(join(root, dir, 'index.ts'), 'export {};');
  }
  writeFileSync(join(root, 'lock.json'), '{}');
  writeFileSync(join(root, 'runs.log'), '');
});
after(() => rmSync(root, { recursive: true, force: true }));

test('the first build builds every part, in order', async () => {
  const lines = [];
  const results = await buildChanged(root, { parts: parts(), log: (l) => lines.push(l) });
  assert.deepEqual(
    results.map((r) => [r.name, r.built, r.reason]),
    [
      ['lib', true, 'never built'],
      ['client', true, 'lib was rebuilt'],
      ['server', true, 'lib was rebuilt'],
    ],
  );
  assert.deepEqual(runs(), ['client', 'lib', 'server']);
  assert.ok(lines.some((l) => l.startsWith('built lib in ')));
});

test('nothing changed: nothing is rebuilt', async () => {
  writeFileSync(join(root, 'runs.log'), '');
  const results = await buildChanged(root, { parts: parts() });
  assert.deepEqual(
    results.map((r) => r.built),
    [false, false, false],
  );
  assert.deepEqual(runs(), []);
});

test('a changed server file rebuilds the server only', async () => {
  writeFileSync(join(root, 'runs.log'), '');
  edit('server/src/index.ts');
  const results = await buildChanged(root, { parts: parts() });
  assert.deepEqual(
    results.map((r) => [r.name, r.built]),
    [
      ['lib', false],
      ['client', false],
      ['server', true],
    ],
  );
  assert.equal(results[2].reason, 'server/src changed');
  assert.deepEqual(runs(), ['server']);
});

test('a new lockfile rebuilds the parts that read it; a library change rebuilds all', async () => {
  writeFileSync(join(root, 'runs.log'), '');
  edit('lock.json');
  await buildChanged(root, { parts: parts() });
  assert.deepEqual(runs(), ['client', 'server']);
  writeFileSync(join(root, 'runs.log'), '');
  edit('lib/src/index.ts');
  await buildChanged(root, { parts: parts() });
  assert.deepEqual(runs(), ['client', 'lib', 'server']);
});

test('a deleted output is built again; test files do not count as inputs', async () => {
  writeFileSync(join(root, 'runs.log'), '');
  rmSync(join(root, 'client/dist'), { recursive: true });
  writeFileSync(join(root, 'server/src/index.spec.ts'), 'test');
  const later = new Date(Date.now() + 60_000);
  utimesSync(join(root, 'server/src/index.spec.ts'), later, later);
  utimesSync(join(root, 'server/src'), new Date(), new Date(0)); // the folder's own time
  await buildChanged(root, { parts: parts() });
  assert.deepEqual(runs(), ['client']);
});

test('a failed build stops with its output and stays stale', async () => {
  edit('server/src/index.ts');
  const broken = parts();
  broken[2] = part('server', ['server/src', 'lib/src', 'lock.json'], ['lib'], true);
  await assert.rejects(
    buildChanged(root, { parts: broken }),
    /building server failed:\n.*type error on line 3/s,
  );
  // the failing script wrote its output before failing: still older than the edit
  assert.equal(staleReason(root, broken[2]), 'server/src changed');
});

test('the real parts name inputs that exist', () => {
  const repo = join(import.meta.dirname, '..', '..');
  for (const p of PARTS)
    for (const input of p.inputs) assert.ok(existsSync(join(repo, input)), input);
});
