// The figures and budgets of one run (issues 7 and 19). Speed is judged as a ratio to a
// ceiling measured in the same run on the same file (a raw node:http + better-sqlite3
// server, hand-written SQL, the same CSV writer without the framework), so a slower or
// busier machine moves both sides; memory and the first screen's JavaScript stay absolute
// (they do not depend on the machine's speed), and so does the Lot page, printed beside
// the time of a blank page in the same browser.
import { fmt } from './report.mjs';
import { median } from './load.mjs';

const LIMITS = {
  scorecardsComputedRatio: 1.0, // issue 19: computed (first call) ≤ 1.0 × hand-written SQL
  lotsUncachedThroughput: 0.5, // issue 19: ≥ 0.5 × the raw server, no page kept
  lotsUncachedP95: 2.0, // issue 19: p95 ≤ 2 × the raw server's p95
  readingsRatio: 0.3, // issue 19: ≥ 0.3 × node:http + better-sqlite3, same durability
  exportRatio: 0.5, // issue 19: ≥ 0.5 × better-sqlite3 + the same CSV writer
  exportPeakMb: 250, // issue 7
  firstScreenKb: 300, // issue 7: gzip
  lotPageMs: 1500, // issue 7
  growth: 1.5, // issue 19: lot list p95 and Lot page grow ≤ 1.5 × when the data grows 5 ×
  faultHealthMs: 1000, // a second's wait for an unrelated request while one user imports (common practice, no source)
  faultPngStatus: 422, // issue 17: a photo whose data would inflate past its pixels is refused
  faultPeakMb: 250, // issue 7's server ceiling (exportPeakMb), also with the PNG in hand
};

export function judge(report, m, { growthLabel }) {
  const f = (name, value, unit, digits) => report.figure(name, value, unit, digits);

  const s = m.scorecards ?? {};
  f('scorecards api median (kept)', s.apiMs, 'ms');
  f('scorecards api first call (computed)', s.firstMs, 'ms');
  const scComputed = f('scorecards api computed median', s.computedMs, 'ms');
  const scRaw = f('scorecards raw sql median', s.rawMs, 'ms');
  const scRatio = f('scorecards computed api/raw', scComputed / scRaw, 'x', 2);

  const api = m.lots?.api ?? {};
  const apiU = m.lots?.apiUncached ?? {};
  const raw = m.lots?.raw ?? {};
  const rawU = m.lots?.rawUncached ?? {};
  f('lot list uncached rps', apiU.rps, 'req/s');
  const p95U = f('lot list uncached p95', apiU.p95, 'ms');
  f('lot list raw server uncached rps', rawU.rps, 'req/s');
  const rawP95U = f('lot list raw server uncached p95', rawU.p95, 'ms');
  const shareU = f('lot list uncached api/raw', apiU.rps / rawU.rps, 'x', 2);
  const p95RatioU = f('lot list uncached p95 api/raw', p95U / rawP95U, 'x', 2);
  f('lot list cached rps', api.rps, 'req/s');
  f('lot list cached p95', api.p95, 'ms');
  f('lot list cached p99', api.p99, 'ms');
  f('lot list raw server rps', raw.rps, 'req/s');
  f('lot list cached api/raw', api.rps / raw.rps, 'x', 2);

  const rd = m.readings ?? {};
  f('readings created', rd.api?.rps, '/s');
  f('readings created p95', rd.api?.p95, 'ms');
  f('readings raw server', rd.raw?.rps, '/s');
  const rdRatio = f('readings api/raw', rd.api?.rps / rd.raw?.rps, 'x', 2);

  const ex = m.exports ?? {};
  f('return export', ex.returnRowsPerS, 'rows/s', 0);
  f('return export raw', ex.raw?.returnRowsPerS, 'rows/s', 0);
  const retRatio = f('return export api/raw', ex.returnRowsPerS / ex.raw?.returnRowsPerS, 'x', 2);
  f('supplier export', ex.supplierRowsPerS, 'rows/s', 0);
  f('supplier export raw', ex.raw?.supplierRowsPerS, 'rows/s', 0);
  const supRatio = f(
    'supplier export api/raw',
    ex.supplierRowsPerS / ex.raw?.supplierRowsPerS,
    'x',
    2,
  );
  f('supplier export rows', ex.supplierRows, 'rows', 0);
  const peak = f('exports server peak memory', ex.peakMb, 'MB');

  const js = f('first-screen js gzip', m.js?.gzipKb, 'kB');
  const ready = f('lot page ready median of 5', median(m.client?.times ?? []), 'ms', 0);
  const blank = f('blank page median of 5', median(m.client?.blanks ?? []), 'ms', 0);
  f('lot page ready / blank page', ready / blank, 'x', 1);

  const g = m.growth ?? {};
  const gLots = f(
    `lot list uncached p95 growth ${growthLabel}`,
    p95U / g.lots?.apiUncached?.p95,
    'x',
    2,
  );
  const gPage = f(`lot page growth ${growthLabel}`, ready / median(g.client?.times ?? []), 'x', 2);
  const gSc = f(
    `scorecards computed growth ${growthLabel}`,
    scComputed / g.scorecards?.computedMs,
    'x',
    2,
  );
  const gRows = f(
    `scorecards rows read growth ${growthLabel}`,
    s.rows / g.scorecards?.rows,
    'x',
    2,
  );

  const fl = m.faults ?? {};
  f(`fault readings import of ${fl.import?.rows ?? 2000} rows`, fl.import?.ms, 'ms', 0);
  f('fault health check p95 during the import', fl.import?.healthP95Ms, 'ms');
  f('fault health check slowest answer during the import', fl.import?.healthMaxMs, 'ms', 0);
  f('fault health checks answered during the import', fl.import?.healthCalls, '', 0);
  f('fault health checks failed during the import', fl.import?.healthFailed, '', 0);
  f(
    fl.backup?.finished === false
      ? 'fault backup under one reading a second: NOT FINISHED, stopped after'
      : 'fault backup time under one reading a second',
    fl.backup?.ms,
    'ms',
    0,
  );
  f('fault readings answered during the backup', fl.backup?.readingsDuring, '', 0);
  f('fault inflating png file', fl.png?.fileKb, 'kB');
  f('fault inflating png answer', fl.png?.status, '(HTTP status)', 0);
  f('fault inflating png time', fl.png?.ms, 'ms', 0);
  f('fault inflating png server peak before', fl.png?.peakBeforeMb, 'MB');
  f('fault inflating png server peak after', fl.png?.peakAfterMb, 'MB');
  f('fault inflating png check peak growth (in process)', fl.bomb?.bomb?.peakRssGrowthMb, 'MB', 0);

  const L = LIMITS;
  report.budget('scorecards', [
    [
      scRatio <= L.scorecardsComputedRatio,
      `computed ${fmt(scRatio, 2)}x vs ≤ ${L.scorecardsComputedRatio}x raw SQL`,
    ],
  ]);
  report.budget('lot-list', [
    [
      shareU >= L.lotsUncachedThroughput,
      `uncached ${fmt(shareU, 2)}x vs ≥ ${L.lotsUncachedThroughput}x raw`,
    ],
    [
      p95RatioU <= L.lotsUncachedP95,
      `uncached p95 ${fmt(p95RatioU, 2)}x vs ≤ ${L.lotsUncachedP95}x raw`,
    ],
  ]);
  report.budget('readings', [
    [rdRatio >= L.readingsRatio, `${fmt(rdRatio, 2)}x vs ≥ ${L.readingsRatio}x raw`],
  ]);
  report.budget('return-export', [
    [retRatio >= L.exportRatio, `${fmt(retRatio, 2)}x vs ≥ ${L.exportRatio}x raw`],
  ]);
  report.budget('supplier-export', [
    [supRatio >= L.exportRatio, `${fmt(supRatio, 2)}x vs ≥ ${L.exportRatio}x raw`],
  ]);
  report.budget('exports-memory', [
    [peak <= L.exportPeakMb, `peak ${fmt(peak)} MB vs ≤ ${L.exportPeakMb} MB`],
  ]);
  report.budget('first-screen-js', [
    [js <= L.firstScreenKb, `${fmt(js)} kB vs ≤ ${L.firstScreenKb} kB gzip`],
  ]);
  report.budget('lot-page', [[ready <= L.lotPageMs, `${fmt(ready, 0)} ms vs ≤ ${L.lotPageMs} ms`]]);
  report.budget('growth-lot-list', [
    [gLots <= L.growth, `p95 ${fmt(gLots, 2)}x vs ≤ ${L.growth}x ${growthLabel}`],
  ]);
  report.budget('growth-lot-page', [
    [gPage <= L.growth, `${fmt(gPage, 2)}x vs ≤ ${L.growth}x ${growthLabel}`],
  ]);
  report.budget('growth-scorecards', [
    [gSc <= gRows, `${fmt(gSc, 2)}x vs ≤ ${fmt(gRows, 2)}x, the growth of the rows read`],
  ]);
  // Faults: survived, and the import does not hold everyone else up.
  report.budget('fault-import', [
    [Number.isFinite(fl.import?.ms), `${fl.import?.rows ?? 2000} rows imported`],
    [
      fl.import?.healthMaxMs <= L.faultHealthMs && fl.import?.healthFailed === 0,
      `health checks meanwhile: slowest ${fmt(fl.import?.healthMaxMs, 0)} ms vs ≤ ${L.faultHealthMs} ms, ${fl.import?.healthFailed ?? 'n/a'} failed`,
    ],
  ]);
  report.budget('fault-backup', [
    [
      fl.backup?.finished === true,
      fl.backup?.finished === true
        ? `finished in ${fmt(fl.backup.ms / 1000)} s under one reading a second`
        : 'did not finish',
    ],
    [
      fl.backup?.readingsDuring > 0,
      `${fl.backup?.readingsDuring ?? 0} readings answered meanwhile`,
    ],
  ]);
  report.budget('fault-png', [
    [
      fl.png?.status === L.faultPngStatus,
      `answered ${fl.png?.status ?? 'nothing'} vs ${L.faultPngStatus}`,
    ],
    [
      fl.png?.peakAfterMb <= L.faultPeakMb,
      `server peak ${fmt(fl.png?.peakAfterMb)} MB vs ≤ ${L.faultPeakMb} MB`,
    ],
  ]);
}
