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
import { imageBombFigures } from './lib/image-bomb.mjs';
import { backupPhase, pngPhase } from './lib/phase-faults.mjs';
import { importPhase } from './lib/phase-import.mjs';
import { lotListPhase, scorecardsPhase } from './lib/phase-reads.mjs';
import { exportsPhase, openSamples, readingsPhase } from './lib/phase-writes.mjs';
import { judge } from './lib/budgets.mjs';
import { Report } from './lib/report.mjs';
import { signIn, startServer } from './lib/server.mjs';
import { BENCH_PASSWORD, BENCH_USERS } from './seed/catalog.mjs';

const ROOT = join(import.meta.dirname, '..');
const log = (...a) => console.error('#', ...a);
const args = parseArgs(process.argv.slice(2), {
  quick: false,
  suppliers: 0,
  lots: 0,
  seconds: 0,
});
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
// Growth: the read paths again on a set 1/5 the size (issue 19: 10 000 and 50 000 lots).
const GROWTH = 5;
// Faults: how far the inflating PNG's data inflates (MiB).
const bombMb = quick ? 64 : 1024;

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

const small = { ...params, lots: Math.round(params.lots / GROWTH) };
const growthLabel = `${GROWTH}x data`;
log(
  `data sets: ${params.suppliers} suppliers, ${small.lots} and ${params.lots} lots over ${params.years} years`,
);
const dataset = await cachedDataset(params);
log(dataset.built ? `built ${dataset.file}` : `reusing ${dataset.file}`);
const smallSet = await cachedDataset(small);
log(smallSet.built ? `built ${smallSet.file}` : `reusing ${smallSet.file}`);
const scratch = mkdtempSync(join(tmpdir(), 'gp-bench-'));
const m = {};

/** An accepted kit lot (the Lot page measured) and the clerk's id, from the file. */
function fileFacts(dbPath) {
  const db = new Database(dbPath, { readonly: true });
  try {
    const lot = db
      .prepare(
        `select l.id from lots l join products p on p.id = l.product_id
          where l.status = 'accepted' and p.kind = 'kit' order by l.id desc limit 1`,
      )
      .get();
    const open = db
      .prepare(
        `select id from lots where status in ('on_hold', 'inspecting') order by id desc limit 1`,
      )
      .get();
    const clerk = db.prepare('select id from users where email = ?').get(BENCH_USERS.clerk);
    return { kitLotId: lot.id, openLotId: open.id, clerkId: clerk.id };
  } finally {
    db.close();
  }
}

const lotPage = (base, facts) =>
  lotPageReady(base, facts.kitLotId, BENCH_USERS.qa, BENCH_PASSWORD, 5);

try {
  const dbPath = scratchCopy(dataset.file, scratch);
  const facts = fileFacts(dbPath);
  const server = await startServer({ dbPath, uploadDir: join(scratch, 'uploads') });
  try {
    const admin = await signIn(server.base, BENCH_USERS.admin, BENCH_PASSWORD);
    const clerk = await signIn(server.base, BENCH_USERS.clerk, BENCH_PASSWORD);
    m.scorecards = await phase('scorecards', () =>
      scorecardsPhase({ base: server.base, token: admin, dbPath, calls: 20, computed: 5 }),
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
        clerkId: facts.clerkId,
      }),
    );
    m.client = await phase('client', () => lotPage(server.base, facts));
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
  // Faults, on another fresh server: the inflating PNG first (its peak is then its own),
  // the readings import, a backup under one reading a second.
  const faultServer = await startServer({ dbPath, uploadDir: join(scratch, 'uploads') });
  m.faults = {};
  try {
    const clerk = await signIn(faultServer.base, BENCH_USERS.clerk, BENCH_PASSWORD);
    const qa = await signIn(faultServer.base, BENCH_USERS.qa, BENCH_PASSWORD);
    m.faults.png = await phase('fault: inflating png', () =>
      pngPhase({
        base: faultServer.base,
        token: clerk,
        pid: faultServer.pid,
        lotId: facts.openLotId,
        inflateMb: bombMb,
      }),
    );
    m.faults.bomb = await phase('fault: inflating png, check in process', () =>
      imageBombFigures({ inflateMb: bombMb }),
    );
    m.faults.import = await phase('fault: readings import', () =>
      importPhase({
        base: faultServer.base,
        token: clerk,
        qaToken: qa,
        dbPath,
      }),
    );
    m.faults.backup = await phase('fault: backup under readings', async () => {
      // The readings phase's samples, or (when it failed) those with room taken from the file.
      const target = m.readings?.samples?.length
        ? { samples: m.readings.samples, instruments: m.readings.instruments }
        : openSamples(dbPath);
      return backupPhase({
        base: faultServer.base,
        token: clerk,
        dbPath,
        uploadDir: join(scratch, 'uploads'),
        samples: target.samples,
        instruments: target.instruments,
        out: join(scratch, 'backup.sqlite'),
        limitS: quick ? 60 : 180,
      });
    });
  } finally {
    await faultServer.stop();
  }
  rmSync(dbPath, { force: true });
  rmSync(join(scratch, 'backup.sqlite'), { force: true });
  rmSync(join(scratch, 'backup.sqlite.uploads'), { recursive: true, force: true });

  // Growth: the same read paths on the set 1/GROWTH the size.
  const smallPath = scratchCopy(smallSet.file, scratch, 'small.sqlite');
  const smallFacts = fileFacts(smallPath);
  const smallServer = await startServer({ dbPath: smallPath, uploadDir: join(scratch, 'uploads') });
  m.growth = {};
  try {
    const admin = await signIn(smallServer.base, BENCH_USERS.admin, BENCH_PASSWORD);
    m.growth.scorecards = await phase('growth: scorecards', () =>
      scorecardsPhase({
        base: smallServer.base,
        token: admin,
        dbPath: smallPath,
        calls: 1,
        computed: 5,
      }),
    );
    m.growth.lots = await phase('growth: lot list', () =>
      lotListPhase({
        base: smallServer.base,
        token: admin,
        dbPath: smallPath,
        seconds,
        connections: listConnections,
        uncachedOnly: true,
      }),
    );
    m.growth.client = await phase('growth: lot page', () => lotPage(smallServer.base, smallFacts));
  } finally {
    await smallServer.stop();
  }
} finally {
  rmSync(scratch, { recursive: true, force: true });
}

judge(report, m, { growthLabel });
report.printBudgets();
if (report.missing.length) {
  console.error(`not measured: ${report.missing.join(', ')}`);
  process.exit(1);
}
if (quick) log('quick run: budgets are judged on the full run only');
