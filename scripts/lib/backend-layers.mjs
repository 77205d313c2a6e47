// The layers of apps/backend/src, bottom first, and the check that every import between
// its folders points down (DEVELOPERS.md "Layout and why"). A folder may import its own
// files and the folders of lower layers; never a folder of its own layer or of a higher
// one. The files at the root of src/ (main.ts, app.module.ts, app.factory.ts) compose the
// whole app and may import anything; nothing imports them.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import ts from 'typescript';

export const BACKEND_LAYERS = [
  // Plain building blocks: settings, migrations (they import nothing of the app).
  ['config', 'migrations'],
  // Errors, pipes, SQL helpers, the change counters the caches are keyed by.
  ['common'],
  // Who may call a route: roles, @Roles/@Public/@CurrentUser, the signed-in user's shape.
  ['auth'],
  // The audit trail's writer: every other domain records through it.
  ['audit'],
  ['users'],
  // Sign-in, session tokens and the guard (they read accounts); files, e-mail, health, ops.
  ['sessions', 'storage', 'mail', 'health', 'ops'],
  // Notices are raised by any domain; the states they watch are registered from above.
  ['notices'],
  ['suppliers', 'instruments'],
  ['products'],
  ['lots'],
  ['inspection'],
  ['photos', 'decisions'],
  // Read models and documents over the lot and its evidence.
  ['lot-page', 'documents', 'exports', 'corrective-actions'],
  ['returns', 'scorecards', 'audit-trail'],
  // The supplier's token-checked pages: over SCARs, returns, photos and mail.
  ['supplier-portal'],
  // Composition: the entity list and ORM options, the demo seed.
  ['database', 'seed'],
];

function* typeScriptFiles(dir) {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) yield* typeScriptFiles(path);
    else if (name.endsWith('.ts')) yield path;
  }
}

/**
 * Every relative import, export-from, dynamic import() and require() of the files under
 * `srcDir` that crosses from one top folder into another, type-only imports included.
 */
export function folderImports(srcDir) {
  const root = resolve(srcDir);
  const found = [];
  for (const file of typeScriptFiles(root)) {
    const [from, ...rest] = relative(root, file).split(sep);
    if (rest.length === 0) continue; // main.ts, app.module.ts, app.factory.ts
    const { importedFiles } = ts.preProcessFile(readFileSync(file, 'utf8'), true, true);
    for (const { fileName } of importedFiles) {
      if (!fileName.startsWith('.')) continue;
      const target = relative(root, resolve(dirname(file), fileName)).split(sep);
      const to = target.length > 1 ? target[0] : target[0].replace(/\.(ts|js)$/, '');
      if (to !== from) found.push({ file: relative(root, file), from, to, specifier: fileName });
    }
  }
  return found;
}

/** Problems: imports that do not point down, and folders the order does not place. */
export function layerProblems(srcDir, layers = BACKEND_LAYERS) {
  const levelOf = new Map(layers.flatMap((folders, level) => folders.map((f) => [f, level])));
  const root = resolve(srcDir);
  const problems = [];
  for (const name of readdirSync(root)) {
    if (statSync(join(root, name)).isDirectory() && !levelOf.has(name)) {
      problems.push(`${name}/ has no layer: place it in the layer order`);
    }
  }
  for (const imp of folderImports(root)) {
    const from = levelOf.get(imp.from);
    const to = levelOf.get(imp.to);
    if (from === undefined) continue; // reported above
    if (to === undefined) {
      problems.push(`${imp.file} imports ${imp.specifier}, outside the layered folders`);
    } else if (to === from) {
      problems.push(`${imp.file} imports ${imp.specifier}: ${imp.to}/ is in its own layer`);
    } else if (to > from) {
      problems.push(`${imp.file} imports ${imp.specifier}: ${imp.to}/ is above ${imp.from}/`);
    }
  }
  return problems;
}
