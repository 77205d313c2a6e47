// The figures and budgets of issue 7, from the measurements of one run.
import { fmt } from './report.mjs';
import { median } from './load.mjs';

const LIMITS = {
  scorecardsRatio: 1.5, // issue 7: ≤ 1.5 × raw SQL
  scorecardsMs: 250, // issue 7: under 250 ms
  lotsP95Ms: 50, // issue 7: p95 ≤ 50 ms at 50 connections
  lotsThroughput: 0.4, // issue 7: ≥ 40 % of the raw server's throughput
  readingsPerS: 300, // issue 7
  exportRowsPerS: 50_000, // issue 7
  exportPeakMb: 250, // issue 7
  firstScreenKb: 300, // issue 7: gzip
  lotPageMs: 1500, // issue 7
};

export function judge(report, m) {
  const f = (name, value, unit, digits) => report.figure(name, value, unit, digits);
  const s = m.scorecards ?? {};
  const scApi = f('scorecards api median', s.apiMs, 'ms');
  f('scorecards api first call (computed)', s.firstMs, 'ms');
  const scRaw = f('scorecards raw sql median', s.rawMs, 'ms');
  const scRatio = f('scorecards api/raw', scApi / scRaw, 'x', 2);
  const api = m.lots?.api ?? {};
  const raw = m.lots?.raw ?? {};
  f('lot list rps', api.rps, 'req/s');
  f('lot list p50', api.p50, 'ms');
  const p95 = f('lot list p95', api.p95, 'ms');
  f('lot list p99', api.p99, 'ms');
  f('lot list raw server rps', raw.rps, 'req/s');
  const share = f('lot list throughput api/raw', api.rps / raw.rps, 'x', 2);
  const rd = m.readings ?? {};
  const perS = f('readings created', rd.rps, '/s');
  f('readings created p95', rd.p95, 'ms');
  const im = m.import ?? {};
  f(`readings import of ${im.rows ?? 2000} rows`, im.ms, 'ms', 0);
  f('health check slowest answer during the import', im.healthMaxMs, 'ms', 0);
  const ex = m.exports ?? {};
  const retRate = f('return export', ex.returnRowsPerS, 'rows/s', 0);
  const supRate = f('supplier readings export', ex.supplierRowsPerS, 'rows/s', 0);
  f('supplier readings export rows', ex.supplierRows, 'rows', 0);
  const peak = f('exports server peak memory', ex.peakMb, 'MB');
  const js = f('first-screen js gzip', m.js?.gzipKb, 'kB');
  const ready = f('lot page ready median of 5', m.client ? median(m.client.times) : NaN, 'ms', 0);

  report.budget('scorecards', [
    [scRatio <= LIMITS.scorecardsRatio, `${fmt(scRatio, 2)}x vs ≤ ${LIMITS.scorecardsRatio}x raw`],
    [scApi < LIMITS.scorecardsMs, `${fmt(scApi)} ms vs < ${LIMITS.scorecardsMs} ms`],
  ]);
  report.budget('lot-list', [
    [p95 <= LIMITS.lotsP95Ms, `p95 ${fmt(p95)} ms vs ≤ ${LIMITS.lotsP95Ms} ms`],
    [
      share >= LIMITS.lotsThroughput,
      `${fmt(share * 100, 0)} % vs ≥ ${LIMITS.lotsThroughput * 100} % of raw`,
    ],
  ]);
  report.budget('readings', [
    [perS >= LIMITS.readingsPerS, `${fmt(perS)}/s vs ≥ ${LIMITS.readingsPerS}/s`],
  ]);
  report.budget('exports', [
    [
      retRate >= LIMITS.exportRowsPerS,
      `return ${fmt(retRate, 0)} rows/s vs ≥ ${LIMITS.exportRowsPerS}`,
    ],
    [
      supRate >= LIMITS.exportRowsPerS,
      `supplier ${fmt(supRate, 0)} rows/s vs ≥ ${LIMITS.exportRowsPerS}`,
    ],
    [peak <= LIMITS.exportPeakMb, `peak ${fmt(peak)} MB vs ≤ ${LIMITS.exportPeakMb} MB`],
  ]);
  report.budget('first-screen-js', [
    [js <= LIMITS.firstScreenKb, `${fmt(js)} kB vs ≤ ${LIMITS.firstScreenKb} kB gzip`],
  ]);
  report.budget('lot-page', [
    [ready <= LIMITS.lotPageMs, `${fmt(ready, 0)} ms vs ≤ ${LIMITS.lotPageMs} ms`],
  ]);
}
