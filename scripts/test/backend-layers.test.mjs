// The backend's folder layers (scripts/lib/backend-layers.mjs): every import between the
// folders of apps/backend/src points down, and the check itself on a scratch tree.
import assert from 'node:assert/strict';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { after, test } from 'node:test';
import { BACKEND_LAYERS, folderImports, layerProblems } from '../lib/backend-layers.mjs';

const backendSrc = join(dirname(fileURLToPath(import.meta.url)), '../../apps/backend/src');

test("every import between the backend's folders points down the declared layers", () => {
  assert.deepEqual(layerProblems(backendSrc), []);
});

test('the layer order names each folder once', () => {
  const folders = BACKEND_LAYERS.flat();
  assert.equal(new Set(folders).size, folders.length);
});

test('the lot page reads inspection, decisions and photos from above; they never import it', () => {
  const imports = folderImports(backendSrc);
  const into = (to) => new Set(imports.filter((i) => i.to === to).map((i) => i.from));
  assert.deepEqual([...into('lot-page')], []);
  for (const below of ['decisions', 'photos']) {
    assert.ok(!into(below).has('inspection'), `inspection/ imports ${below}/`);
  }
  const fromLotPage = new Set(imports.filter((i) => i.from === 'lot-page').map((i) => i.to));
  for (const below of ['inspection', 'decisions', 'photos']) assert.ok(fromLotPage.has(below));
});

const scratch = mkdtempSync(join(tmpdir(), 'gp-layers-'));
after(() => rmSync(scratch, { recursive: true, force: true }));

function tree(name, files) {
  const root = join(scratch, name);
  for (const [path, text] of Object.entries(files)) {
    mkdirSync(dirname(join(root, path)), { recursive: true });
    writeFileSync(join(root, path), text);
  }
  return root;
}

const LAYERS = [['common'], ['lots'], ['inspection', 'photos']];

test('an import up, or across one layer, fails; down, within a folder and from the root passes', () => {
  const root = tree('mixed', {
    'main.ts': "import { App } from './inspection/app';\n",
    'common/ids.ts': 'export const x = 1;\n',
    'lots/lot.ts': "import { x } from '../common/ids';\nimport { y } from './y';\n",
    'lots/y.ts': "export { Sample } from '../inspection/entities/sample';\n",
    'inspection/entities/sample.ts': "import type { Lot } from '../../lots/lot';\n",
    'inspection/app.ts': "const p = import('../photos/view');\n",
    'photos/view.ts': "const l = require('../lots/lot');\n",
  });
  assert.deepEqual(layerProblems(root, LAYERS), [
    'inspection/app.ts imports ../photos/view: photos/ is in its own layer',
    'lots/y.ts imports ../inspection/entities/sample: inspection/ is above lots/',
  ]);
});

test('a folder the order does not place fails, and so does an import into it', () => {
  const root = tree('unplaced', {
    'common/ids.ts': "import { s } from '../scratchpad/s';\n",
    'scratchpad/s.ts': 'export const s = 1;\n',
  });
  assert.deepEqual(layerProblems(root, LAYERS), [
    'scratchpad/ has no layer: place it in the layer order',
    'common/ids.ts imports ../scratchpad/s, outside the layered folders',
  ]);
});

test('type-only imports count: a type is a dependency too', () => {
  const root = tree('types', {
    'common/ids.ts': "import type { Lot } from '../lots/lot';\nexport type Id = Lot['id'];\n",
    'lots/lot.ts': 'export interface Lot { id: number }\n',
  });
  assert.deepEqual(layerProblems(root, LAYERS), [
    'common/ids.ts imports ../lots/lot: lots/ is above common/',
  ]);
});
