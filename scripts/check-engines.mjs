// Every installed package must run on every Node version the project declares in
// package.json `engines.node`: npm only warns (EBADENGINE) when one does not, and a
// package that needs a newer Node may fail at run time. Installs nothing; reads the
// lockfile and the package.json of each installed package. Run by `npm run lint`.
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import semver from 'semver';

/**
 * The packages under `root` whose `engines.node` does not include the whole of the
 * project's own range. Installed packages are read from disk; lockfile entries that are
 * not installed (other platforms' optional binaries) are skipped.
 * @returns {{ projectRange: string, checked: number, problems: string[] }}
 */
export function checkEngines(root) {
  const project = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));
  const projectRange = project.engines?.node;
  if (!projectRange || !semver.validRange(projectRange)) {
    return {
      projectRange: String(projectRange),
      checked: 0,
      problems: ['package.json: engines.node is missing or not a valid range'],
    };
  }
  const lock = JSON.parse(readFileSync(join(root, 'package-lock.json'), 'utf8'));
  const problems = [];
  let checked = 0;
  for (const [path, entry] of Object.entries(lock.packages ?? {})) {
    if (!path.includes('node_modules/')) continue;
    const manifest = join(root, path, 'package.json');
    if (!existsSync(manifest)) {
      if (!entry.optional && !entry.dev && !entry.devOptional && !entry.peer) {
        problems.push(`${path}: in the lockfile but not installed (run npm ci)`);
      }
      continue;
    }
    const pkg = JSON.parse(readFileSync(manifest, 'utf8'));
    checked += 1;
    const wanted = pkg.engines?.node;
    if (wanted === undefined) continue;
    if (typeof wanted !== 'string' || !semver.validRange(wanted)) {
      problems.push(
        `${path}: ${pkg.name}@${pkg.version} declares engines.node "${wanted}", not a range`,
      );
    } else if (!semver.subset(projectRange, wanted)) {
      problems.push(
        `${path}: ${pkg.name}@${pkg.version} needs Node "${wanted}", the project declares "${projectRange}"`,
      );
    }
  }
  return { projectRange, checked, problems };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const root = process.argv[2] ?? join(dirname(fileURLToPath(import.meta.url)), '..');
  const { projectRange, checked, problems } = checkEngines(root);
  if (problems.length > 0) {
    console.error(`engines: ${problems.length} problem(s) against node "${projectRange}":`);
    for (const p of problems) console.error(`  - ${p}`);
    console.error(
      'Pin or override the package (package.json "overrides") to a version that runs on that range.',
    );
    process.exit(1);
  }
  console.log(`engines: ${checked} installed packages run on node "${projectRange}"`);
}
