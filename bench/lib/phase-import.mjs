// The readings CSV import (issue 17): one file of 2 000 rows into an open lot, timed, with
// /api/health polled meanwhile to show the import does not hold the server.
import { get } from 'node:http';
import Database from 'better-sqlite3';
import { MATERIALS } from '@gaugeproof/standards';
import { percentile } from './load.mjs';

/** Rows of the timed file: the example, 34 minutes before the one write path. */
export const IMPORT_ROWS = 2000;
/** Live readings one sample may hold (apps/backend reading-writer.ts, issue 17 item 10). */
const PER_SAMPLE = 20;

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

/**
 * A lot whose plan has room for the whole file under the per-sample cap: the bench set's
 * lots are planned at S-3 (a few units), so one is received for the purpose, of a kit
 * inspected at general level II (1 200 kits: 80 units × 2 conductors, ISO 2859-1 Table 1
 * and Table II-A, code letter J).
 */
async function roomyLot(base, qaToken, dbPath, target) {
  const db = new Database(dbPath, { readonly: true });
  const { id: supplierId } = db.prepare('select id from suppliers order by id limit 1').get();
  db.close();
  const post = async (path, body) => {
    const res = await fetch(`${base}${path}`, {
      method: 'POST',
      headers: { authorization: `Bearer ${qaToken}`, 'content-type': 'application/json' },
      body: JSON.stringify(body),
    });
    const json = await res.json();
    if (res.status !== 201)
      throw new Error(`import set-up ${path}: ${res.status} ${JSON.stringify(json)}`);
    return json;
  };
  const stamp = Date.now().toString(36).toUpperCase();
  const product = await post('/api/products', {
    supplierId,
    sku: `BENCH-IMPORT-${stamp}`,
    kind: 'kit',
    description: 'Bench import kit, 4 AWG power and ground',
    inspectionLevel: 'II',
    aql: '1.0',
    conductors: [
      { purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper' },
      { purpose: 'ground', gauge: '4 AWG', claimedMaterial: 'copper' },
    ],
  });
  const lot = await post('/api/lots', {
    productId: product.id,
    poNumber: `PO-BENCH-IMPORT-${stamp}`,
    quantity: 1200,
    unit: 'kits',
  });
  return {
    ...target,
    id: lot.id,
    units: lot.samplingPlan.sampleSize,
    conductors: 2,
    specs: product.conductors.map((c) => ({
      areaMm2: c.nominalAreaMm2,
      material: c.claimedMaterial,
    })),
  };
}

export async function importPhase({ base, token, qaToken, dbPath }) {
  let target = importTarget(dbPath);
  if (target.units * target.conductors * PER_SAMPLE < IMPORT_ROWS) {
    target = await roomyLot(base, qaToken, dbPath, target);
  }
  if (target.units * target.conductors * PER_SAMPLE < IMPORT_ROWS) {
    throw new Error(`import: lot ${target.id} has room for fewer than ${IMPORT_ROWS} readings`);
  }
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
