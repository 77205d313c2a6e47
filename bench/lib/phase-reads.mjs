// Read paths: the scorecards against hand-written SQL, the lot list against a raw server.
import { fork } from 'node:child_process';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { load, median } from './load.mjs';
import { scorecardsRaw } from './raw-sql.mjs';
import { freePort, getJson } from './server.mjs';

const DAY = 86_400_000;
const day = (ms) => new Date(ms).toISOString().slice(0, 10);

/** A year of scorecards, to today: `calls` timed API calls and as many raw runs. */
export async function scorecardsPhase({ base, token, dbPath, calls }) {
  const to = day(Date.now());
  const from = day(Date.now() - 364 * DAY);
  const path = `/api/scorecards?from=${from}&to=${to}`;
  // The first call computes the six aggregates; the server keeps the ranking until the
  // next write (ScorecardCache), so the 20 timed calls after it are what a buyer browsing
  // the screen gets. Both are printed.
  const c0 = performance.now();
  await getJson(base, path, token);
  const firstMs = performance.now() - c0;
  const api = [];
  for (let i = 0; i < calls; i++) {
    const t0 = performance.now();
    const body = await getJson(base, path, token);
    api.push(performance.now() - t0);
    if (!Array.isArray(body.items) || body.items.length === 0)
      throw new Error('scorecards: no rows');
  }
  const db = new Database(dbPath, { readonly: true });
  const range = {
    start: Date.parse(`${from}T00:00:00Z`),
    end: Date.parse(`${to}T00:00:00Z`) + DAY,
    today: to,
  };
  scorecardsRaw(db, range);
  const raw = [];
  for (let i = 0; i < calls; i++) {
    const t0 = performance.now();
    const out = scorecardsRaw(db, range);
    raw.push(performance.now() - t0);
    if (out.suppliers.length === 0) throw new Error('raw scorecards: no suppliers');
  }
  db.close();
  return { apiMs: median(api), rawMs: median(raw), firstMs };
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

function listPath(prefix, p) {
  return `${prefix}?status=${p.statuses.join(',')}&q=${encodeURIComponent(p.q)}&sort=${p.sort}&page=1&pageSize=${p.pageSize}`;
}

export async function lotListPhase({ base, token, dbPath, seconds, connections }) {
  const params = lotListParams(dbPath);
  const apiPath = listPath('/api/lots', params);
  const first = await getJson(base, apiPath, token);
  if (!Array.isArray(first.items) || first.items.length === 0)
    throw new Error('lot list: no items');
  const api = await load({
    url: base + apiPath,
    connections,
    seconds,
    headers: { authorization: `Bearer ${token}` },
  });
  if (api.failed) {
    throw new Error(
      `lot list: ${api.failed} failed answers ${JSON.stringify(api.statuses)} (none at all: no answer completed within the ${seconds} s window at ${connections} connections)`,
    );
  }

  const port = await freePort();
  const child = fork(join(import.meta.dirname, 'raw-lots-server.mjs'), [dbPath, String(port)], {
    stdio: 'inherit',
  });
  await new Promise(
    (resolve, reject) => (child.once('message', resolve), child.once('exit', reject)),
  );
  try {
    const rawBase = `http://127.0.0.1:${port}`;
    const check = await getJson(rawBase, listPath('/lots', params), token);
    if (check.total !== first.total) {
      console.error(`  note: raw server counts ${check.total} lots, the API ${first.total}`);
    }
    const raw = await load({ url: rawBase + listPath('/lots', params), connections, seconds });
    if (raw.failed) throw new Error(`raw lot list: ${raw.failed} failed answers`);
    return { api, raw, total: first.total, params };
  } finally {
    child.kill('SIGTERM');
  }
}
