// The readings' ceiling: node:http + better-sqlite3 making the same writes as the API's
// reading entry on the same file, with the same durability (WAL, synchronous = FULL, one
// committed transaction before the answer): read the sample with its lot, product and
// conductor, the instruments and the live readings; compute with the server's own code
// (apps/backend/dist); insert the reading, recompute its siblings, touch the lot, write
// the audit events. No sign-in, validation pipe or ORM. Each request commits alone (the
// API shares a commit among readings posted together: it can beat this).
// Run as a child process: node raw-readings-server.mjs DB PORT USER_ID
import { createServer } from 'node:http';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import Database from 'better-sqlite3';

const require = createRequire(import.meta.url);
const dist = (p) => require(join(import.meta.dirname, '..', '..', 'apps/backend/dist', p));
const { computeReading } = dist('inspection/reading-compute.js');
const { resolutionsFor, snapshot } = dist('inspection/instrument-resolutions.js');
const { auditShape, outcomeOf } = dist('inspection/reading-rules.js');

const [dbPath, port, userId] = process.argv.slice(2);
const db = new Database(dbPath, { fileMustExist: true });
db.pragma('busy_timeout = 5000');
db.pragma('journal_mode = WAL');
db.pragma('foreign_keys = ON');
db.pragma('synchronous = FULL');

const COMPUTED = [
  'area_mm2',
  'u_mm2',
  'expanded_umm2',
  'area_ratio',
  'measures_as',
  'identified_material',
  'material_mismatch',
  'verdict',
  'result',
];
const values = (c) => [
  c.areaMm2,
  c.uMm2,
  c.expandedUMm2,
  c.areaRatio,
  c.measuresAs,
  c.identifiedMaterial,
  c.materialMismatch ? 1 : 0,
  c.verdict,
  JSON.stringify(c.result),
];
const q = {
  sample: db.prepare(
    `select s.lot_id as lotId, l.status, p.min_area_ratio as minAreaRatio,
            c.gauge_label as gaugeLabel, c.claimed_material as claimedMaterial
       from samples s join lots l on l.id = s.lot_id join products p on p.id = l.product_id
       join conductor_specs c on c.id = s.conductor_id where s.id = ?`,
  ),
  siblings: db.prepare(
    `select id, method, inputs, instruments, area_mm2 as areaMm2, measures_as as measuresAs,
            identified_material as identifiedMaterial, material_mismatch as materialMismatch, verdict
       from readings where sample_id = ? and voided = 0 order by taken_at desc, id desc`,
  ),
  insert: db.prepare(
    `insert into readings (sample_id, method, inputs, instruments, ${COMPUTED.join(', ')},
       taken_by_id, taken_at, voided) values (?, ?, ?, ?, ${COMPUTED.map(() => '?').join(', ')}, ?, ?, 0)`,
  ),
  update: db.prepare(
    `update readings set ${COMPUTED.map((c) => `${c} = ?`).join(', ')} where id = ?`,
  ),
  evidence: db.prepare(
    `select count(distinct s.id) as n from samples s join readings r on r.sample_id = s.id
      where s.lot_id = ? and r.voided = 0`,
  ),
  touch: db.prepare('update lots set updated_at = ?, version = version + 1 where id = ?'),
  audit: db.prepare(
    `insert into audit_events (actor_id, actor_email, action, entity_type, entity_id, lot_id,
       before, after, at) values (?, 'raw@bench', ?, 'reading', ?, ?, ?, ?, ?)`,
  ),
};
const instrumentCache = new Map();
function instruments(ids) {
  return ids.map((id) => {
    if (!instrumentCache.has(id)) {
      const row = db
        .prepare(
          `select id, kind, name, serial, resolution, resolution_unit as resolutionUnit,
                  calibration_due_on as calibrationDueOn from instruments where id = ?`,
        )
        .get(id);
      instrumentCache.set(id, row);
    }
    return instrumentCache.get(id);
  });
}

const write = db.transaction((sampleId, body) => {
  const sample = q.sample.get(sampleId);
  if (!sample) return 404;
  const used = instruments(body.instrumentIds);
  const siblings = q.siblings.all(sampleId).map((r) => ({
    ...r,
    inputs: JSON.parse(r.inputs),
    instruments: JSON.parse(r.instruments),
    materialMismatch: r.materialMismatch === 1,
  }));
  const context = {
    gaugeLabel: sample.gaugeLabel,
    claimedMaterial: sample.claimedMaterial,
    minAreaRatio: sample.minAreaRatio,
  };
  const inputs = {
    massG: body.massG,
    lengthMm: body.lengthMm,
    strandingIncrement: body.strandingIncrement,
  };
  const computed = computeReading({
    ...context,
    method: body.method,
    inputs,
    resolutions: resolutionsFor(body.method, used),
    siblings,
  });
  const now = Date.now();
  const snapshots = used.map(snapshot);
  const { lastInsertRowid: id } = q.insert.run(
    sampleId,
    body.method,
    JSON.stringify(inputs),
    JSON.stringify(snapshots),
    ...values(computed),
    Number(userId),
    now,
  );
  const reading = {
    id,
    sampleId,
    method: body.method,
    inputs,
    instruments: snapshots,
    ...computed,
    voided: false,
    voidReason: null,
  };
  q.audit.run(
    Number(userId),
    'reading.create',
    id,
    sample.lotId,
    null,
    JSON.stringify(auditShape(reading)),
    now,
  );
  const live = [{ ...reading }, ...siblings];
  for (const r of siblings) {
    const again = computeReading({
      ...context,
      method: r.method,
      inputs: r.inputs,
      resolutions: resolutionsFor(r.method, r.instruments),
      siblings: live.filter((o) => o.id !== r.id),
    });
    if (outcomeOf(again) === outcomeOf(r)) continue;
    q.update.run(...values(again), r.id);
    const shaped = { ...r, sampleId, voided: false, voidReason: null };
    q.audit.run(
      Number(userId),
      'reading.recompute',
      r.id,
      sample.lotId,
      JSON.stringify(auditShape(shaped)),
      JSON.stringify(auditShape({ ...shaped, ...again })),
      now,
    );
  }
  q.evidence.get(sample.lotId);
  q.touch.run(now, sample.lotId);
  return { id: Number(id), ...computed };
});

const server = createServer((req, res) => {
  const m = /^\/samples\/(\d+)\/readings$/.exec(req.url);
  if (req.method !== 'POST' || !m) {
    res.writeHead(404).end();
    return;
  }
  let text = '';
  req.setEncoding('utf8');
  req.on('data', (d) => (text += d));
  req.on('end', () => {
    try {
      // BEGIN IMMEDIATE, as the server's transactions begin (database/sqlite.config.ts):
      // the API's last writes of its turn may still be committing when this one starts.
      const out = write.immediate(Number(m[1]), JSON.parse(text));
      if (out === 404) {
        res.writeHead(404).end();
        return;
      }
      res.writeHead(201, { 'content-type': 'application/json; charset=utf-8' });
      res.end(JSON.stringify(out));
    } catch (e) {
      res.writeHead(500, { 'content-type': 'text/plain' });
      res.end(String(e?.message ?? e));
    }
  });
});
server.listen(Number(port), '127.0.0.1', () => process.send?.('ready'));
