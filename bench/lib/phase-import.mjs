// The readings CSV import (issue 17): one file of 2 000 rows into an open lot, timed, with
// /api/health polled meanwhile to show the import does not hold the server.
import { get } from 'node:http';
import Database from 'better-sqlite3';
import { MATERIALS } from '@gaugeproof/standards';
import { percentile } from './load.mjs';

/** Rows of the timed file: the example, 34 minutes before the one write path. */
export const IMPORT_ROWS = 2000;

/** The open lot with the most planned samples (units × conductors), and a balance and rule. */
function importTarget(dbPath) {
  const db = new Database(dbPath, { readonly: true });
  const lot = db
    .prepare(
      `select l.id, l.product_id, json_extract(l.sampling_plan, '$.sampleSize') as units,
              (select count(*) from conductor_specs c where c.product_id = l.product_id and c.active = 1) as conductors
         from lots l where l.status in ('on_hold', 'inspecting', 'awaiting_decision')
        order by units * conductors desc, l.id desc limit 1`,
    )
    .get();
  const serial = (kind) =>
    db
      .prepare(
        'select serial from instruments where kind = ? and active = 1 order by calibration_due_on desc',
      )
      .get(kind).serial;
  const instruments = `${serial('balance')};${serial('length_rule')}`;
  if (!lot) throw new Error('import: the data set has no open lot');
  // The lot's conductors in the import's numbering (by position), each with its area and metal.
  const specs = db
    .prepare(
      `select nominal_area_mm2 as areaMm2, claimed_material as material from conductor_specs
        where product_id = ? and active = 1 order by position`,
    )
    .all(lot.product_id);
  db.close();
  return { ...lot, specs, instruments };
}

/** Mass rows spread over every planned unit and conductor of the lot. */
function csvFor(target) {
  const lines = ['unit,conductor,method,massG,lengthMm,instruments'];
  for (let i = 0; i < IMPORT_ROWS; i++) {
    const unit = (i % target.units) + 1;
    const conductor = (Math.floor(i / target.units) % target.conductors) + 1;
    // 1000 mm of the conductor's nominal area of its claimed metal, 2 % lay, a little
    // scatter (another conductor's area or metal is a reading the server now questions).
    const spec = target.specs[conductor - 1];
    const density = (MATERIALS[spec.material] ?? MATERIALS.copper).densityGPerCm3 / 1000;
    const massG =
      Math.round(spec.areaMm2 * density * 1000 * 1.02 * (1 + (i % 7) / 500) * 100) / 100;
    lines.push(`${unit},${conductor},mass,${massG},1000,${target.instruments}`);
  }
  return lines.join('\n');
}

export async function importPhase({ base, token, dbPath }) {
  const target = importTarget(dbPath);
  const form = new FormData();
  form.append('file', new Blob([csvFor(target)], { type: 'text/csv' }), 'bench.csv');
  let importing = true;
  const healthMs = [];
  let healthFailed = 0;
  // Each check on a new connection (node:http, no agent): a check that waits for a busy
  // server is timed to its answer, one that fails is counted; neither is dropped. (fetch's
  // pooled sockets failed with ECONNRESET while the server was held, and those checks were
  // left out, so the p95 showed only the answers from before and after.)
  const poll = (async () => {
    while (importing) {
      const t0 = performance.now();
      const status = await new Promise((resolve) => {
        const req = get(`${base}/api/health`, { agent: false }, (res) => {
          res.resume();
          res.on('end', () => resolve(res.statusCode));
        });
        req.on('error', () => resolve(0));
      });
      if (status === 200) healthMs.push(performance.now() - t0);
      else healthFailed++;
      await new Promise((r) => setTimeout(r, 20));
    }
  })();
  const t0 = performance.now();
  const res = await fetch(`${base}/api/lots/${target.id}/readings/import`, {
    method: 'POST',
    headers: { authorization: `Bearer ${token}` },
    body: form,
  });
  const body = await res.text();
  const ms = performance.now() - t0;
  importing = false;
  await poll;
  if (res.status !== 201) throw new Error(`import: ${res.status} ${body.slice(0, 300)}`);
  return {
    ms,
    rows: IMPORT_ROWS,
    healthMaxMs: Math.max(...healthMs),
    healthP95Ms: percentile(
      [...healthMs].sort((a, b) => a - b),
      95,
    ),
    healthCalls: healthMs.length,
    healthFailed,
  };
}
