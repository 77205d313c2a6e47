// Read paths: the scorecards against hand-written SQL, the lot list against a raw server.
import { fork } from 'node:child_process';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { inTurns, median } from './load.mjs';
import { scorecardsRaw } from './raw-sql.mjs';
import { freePort, getJson } from './server.mjs';

const DAY = 86_400_000;
const day = (ms) => new Date(ms).toISOString().slice(0, 10);

/** A year of scorecards ending today, starting `shift` days later than 364 days ago. */
function yearRange(shift) {
  const to = day(Date.now());
  const from = day(Date.now() - (364 - shift) * DAY);
  return {
    path: `/api/scorecards?from=${from}&to=${to}`,
    raw: {
      start: Date.parse(`${from}T00:00:00Z`),
      end: Date.parse(`${to}T00:00:00Z`) + DAY,
      today: to,
    },
  };
}

/** Rows the scorecards of a range read: its lots and their live readings. */
export function scorecardRows(dbPath, { start, end }) {
  const db = new Database(dbPath, { readonly: true });
  try {
    const lots = db
      .prepare('select count(*) as n from lots where received_at >= ? and received_at < ?')
      .get(start, end).n;
    const readings = db
      .prepare(
        `select count(*) as n from readings r join samples s on s.id = r.sample_id
           join lots l on l.id = s.lot_id where l.received_at >= ? and l.received_at < ?`,
      )
      .get(start, end).n;
    return lots + readings;
  } finally {
    db.close();
  }
}

/**
 * A year of scorecards: the first call, `calls` calls after it (kept by ScorecardCache
 * until the next write, what a buyer browsing the screen gets), and `computed` calls each
 * for a range one day shorter than the last, so each is computed (the cache is per range),
 * against the same ranges by hand-written SQL on the same file.
 */
export async function scorecardsPhase({ base, token, dbPath, calls, computed }) {
  const year = yearRange(0);
  const c0 = performance.now();
  await getJson(base, year.path, token);
  const firstMs = performance.now() - c0;
  const api = [];
  for (let i = 0; i < calls; i++) {
    const t0 = performance.now();
    const body = await getJson(base, year.path, token);
    api.push(performance.now() - t0);
    if (!Array.isArray(body.items) || body.items.length === 0)
      throw new Error('scorecards: no rows');
  }
  const computedMs = [];
  for (let k = 1; k <= computed; k++) {
    const t0 = performance.now();
    await getJson(base, yearRange(k).path, token);
    computedMs.push(performance.now() - t0);
  }
  const db = new Database(dbPath, { readonly: true });
  scorecardsRaw(db, year.raw);
  const raw = [];
  for (let k = 1; k <= computed; k++) {
    const t0 = performance.now();
    const out = scorecardsRaw(db, yearRange(k).raw);
    raw.push(performance.now() - t0);
    if (out.suppliers.length === 0) throw new Error('raw scorecards: no suppliers');
  }
  db.close();
  return {
    apiMs: median(api),
    firstMs,
    computedMs: median(computedMs),
    rawMs: median(raw),
    rows: scorecardRows(dbPath, year.raw),
  };
}

/** The lot list query of the benchmark: decided lots of suppliers named like the main one. */
export function lotListParams(dbPath) {
  const db = new Database(dbPath, { readonly: true });
  const name = db.prepare('select name from suppliers where id = 1').get().name;
  db.close();
  const q = name.split(' ')[0].toLowerCase();
  return {
    statuses: ['accepted', 'accepted_on_concession', 'rejected'],
    q,
    sort: 'receivedAt:desc',
    pageSize: 50,
  };
}

function listPath(prefix, p, page = 1, pageSize = p.pageSize) {
  return `${prefix}?status=${p.statuses.join(',')}&q=${encodeURIComponent(p.q)}&sort=${p.sort}&page=${page}&pageSize=${pageSize}`;
}

/**
 * Requests that no kept page can answer: pages 1-5 at page sizes 41-90, 250 different
 * queries asked in turn, more than the 200 pages the server keeps (lots/lot-list-cache.ts),
 * so each query's page was dropped before it comes round again. The filter set (and so its
 * cached total, which the raw server keeps too) stays the same.
 */
export function uncachedPaths(prefix, p) {
  const paths = [];
  for (let i = 0; i < 250; i++)
    paths.push(listPath(prefix, p, 1 + (i % 5), 41 + Math.floor(i / 5)));
  let n = 0;
  return () => ({ method: 'GET', path: paths[n++ % paths.length] });
}

async function startRaw(script, args) {
  const child = fork(join(import.meta.dirname, script), args, { stdio: 'inherit' });
  await new Promise((resolve, reject) => {
    child.once('message', resolve);
    child.once('exit', reject);
  });
  return child;
}

/**
 * The lot list: one query under load (its page kept by the server), the same filter with
 * no page kept between requests (uncachedPaths), each against the raw server in turns
 * (load.mjs inTurns). `uncachedOnly` runs the uncached API load alone (the growth runs).
 */
export async function lotListPhase({ base, token, dbPath, seconds, connections, uncachedOnly }) {
  const params = lotListParams(dbPath);
  const apiPath = listPath('/api/lots', params);
  const first = await getJson(base, apiPath, token);
  if (!Array.isArray(first.items) || first.items.length === 0)
    throw new Error('lot list: no items');
  const headers = { authorization: `Bearer ${token}` };
  const checked = (name, r) => {
    if (r.failed) {
      throw new Error(
        `${name}: ${r.failed} failed answers ${JSON.stringify(r.statuses)} (none at all: no answer completed within the ${seconds} s window at ${connections} connections)`,
      );
    }
    return r;
  };
  const uncachedApi = {
    url: base,
    connections,
    headers,
    nextRequest: uncachedPaths('/api/lots', params),
  };
  if (uncachedOnly) {
    const [apiUncached] = await inTurns([uncachedApi], { seconds });
    checked('lot list uncached', apiUncached);
    return { apiUncached, total: first.total, params };
  }

  const port = await freePort();
  const child = await startRaw('raw-lots-server.mjs', [dbPath, String(port)]);
  try {
    const rawBase = `http://127.0.0.1:${port}`;
    const check = await getJson(rawBase, listPath('/lots', params), token);
    if (check.total !== first.total) {
      console.error(`  note: raw server counts ${check.total} lots, the API ${first.total}`);
    }
    const [apiUncached, rawUncached] = await inTurns(
      [uncachedApi, { url: rawBase, connections, nextRequest: uncachedPaths('/lots', params) }],
      { seconds },
    );
    checked('lot list uncached', apiUncached);
    checked('raw lot list uncached', rawUncached);
    const [api, raw] = await inTurns(
      [
        { url: base + apiPath, connections, headers },
        { url: rawBase + listPath('/lots', params), connections },
      ],
      { seconds },
    );
    checked('lot list', api);
    checked('raw lot list', raw);
    return { api, apiUncached, raw, rawUncached, total: first.total, params };
  } finally {
    child.kill('SIGTERM');
  }
}

export { startRaw };

/** The benchmark's lot list query as an API path (first page of 50). */
export function lotListPath(dbPath) {
  return listPath('/api/lots', lotListParams(dbPath));
}
