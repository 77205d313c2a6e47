// npm run bench [-- --quick]: builds (or reuses) the large data set, runs the production
// server on a scratch copy and prints one line per figure, then one line per budget.
// --quick: a small set and short load phases, to keep the code paths alive in CI; exits 0
// whatever the budgets say, non-zero if any figure could not be measured.
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { parseArgs } from './lib/args.mjs';
import { firstScreenJs, lotPageReady } from './lib/client.mjs';
import { cachedDataset, scratchCopy } from './lib/dataset.mjs';
import { lotListPhase, scorecardsPhase } from './lib/phase-reads.mjs';
import { exportsPhase, readingsPhase } from './lib/phase-writes.mjs';
import { importPhase } from './lib/phase-import.mjs';
import { judge } from './lib/budgets.mjs';
import { Report } from './lib/report.mjs';
import { signIn, startServer } from './lib/server.mjs';
import { BENCH_PASSWORD, BENCH_USERS } from './seed/catalog.mjs';

const ROOT = join(import.meta.dirname, '..');
const log = (...a) => console.error('#', ...a);
const args = parseArgs(process.argv.slice(2), { quick: false, suppliers: 0, lots: 0, seconds: 0 });
const quick = args.quick;
const params = {
  suppliers: args.suppliers || (quick ? 5 : 200),
  lots: args.lots || (quick ? 300 : 50000),
  years: 3,
  seed: 7,
  log,
};
const seconds = args.seconds || (quick ? 3 : 10);
// Quick runs only keep the code paths alive: few connections, so answers land in the window.
const listConnections = quick ? 5 : 50;
const writeConnections = quick ? 5 : 20;

for (const built of ['apps/backend/dist/main.js', 'apps/frontend/dist/index.html']) {
  if (!existsSync(join(ROOT, built))) {
    console.error(`${built} is missing: run \`npm run build\` first`);
    process.exit(2);
  }
}

const report = new Report();
/** Runs one phase; a failure is logged and leaves its figures unmeasured. */
async function phase(name, work) {
  const t0 = performance.now();
  try {
    const out = await work();
    log(`${name} done in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
    return out;
  } catch (e) {
    log(`${name} FAILED: ${e.stack ?? e}`);
    return null;
  }
}

log(`data set: ${params.suppliers} suppliers, ${params.lots} lots over ${params.years} years`);
const dataset = await cachedDataset(params);
log(dataset.built ? `built ${dataset.file}` : `reusing ${dataset.file}`);
const scratch = mkdtempSync(join(tmpdir(), 'gp-bench-'));
const m = {};
try {
  const dbPath = scratchCopy(dataset.file, scratch);
  const server = await startServer({ dbPath, uploadDir: join(scratch, 'uploads') });
  try {
    const admin = await signIn(server.base, BENCH_USERS.admin, BENCH_PASSWORD);
    const clerk = await signIn(server.base, BENCH_USERS.clerk, BENCH_PASSWORD);
    m.scorecards = await phase('scorecards', () =>
      scorecardsPhase({ base: server.base, token: admin, dbPath, calls: 20 }),
    );
    m.lots = await phase('lot list', () =>
      lotListPhase({
        base: server.base,
        token: admin,
        dbPath,
        seconds,
        connections: listConnections,
      }),
    );
    m.readings = await phase('readings', () =>
      readingsPhase({
        base: server.base,
        token: clerk,
        dbPath,
        seconds,
        connections: writeConnections,
      }),
    );
    m.import = await phase('readings import', () =>
      importPhase({ base: server.base, token: clerk, dbPath }),
    );
    m.client = await phase('client', async () => {
      const db = new Database(dbPath, { readonly: true });
      const lot = db
        .prepare(
          `select l.id from lots l join products p on p.id = l.product_id
            where l.status = 'accepted' and p.kind = 'kit' order by l.id desc limit 1`,
        )
        .get();
      db.close();
      return { times: await lotPageReady(server.base, lot.id, BENCH_USERS.qa, BENCH_PASSWORD, 5) };
    });
    m.js = await phase('first-screen js', async () => firstScreenJs());
  } finally {
    await server.stop();
  }
  // A fresh server, so its peak memory is that of the exports alone.
  const exportServer = await startServer({ dbPath, uploadDir: join(scratch, 'uploads') });
  try {
    const buyer = await signIn(exportServer.base, BENCH_USERS.buyer, BENCH_PASSWORD);
    m.exports = await phase('exports', () =>
      exportsPhase({ base: exportServer.base, token: buyer, dbPath, pid: exportServer.pid }),
    );
  } finally {
    await exportServer.stop();
  }
} finally {
  rmSync(scratch, { recursive: true, force: true });
}

judge(report, m);
report.printBudgets();
if (report.missing.length) {
  console.error(`not measured: ${report.missing.join(', ')}`);
  process.exit(1);
}
if (quick) log('quick run: budgets are judged on the full run only');
