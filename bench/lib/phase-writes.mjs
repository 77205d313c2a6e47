// Write and export paths: readings created under load, the two CSV exports with the
// server's peak memory.
import Database from 'better-sqlite3';
import { MATERIALS } from '@gaugeproof/standards';
import { inTurns, load } from './load.mjs';
import { startRaw } from './phase-reads.mjs';
import { rawExports } from './raw-exports.mjs';
import { freePort, peakRssMb } from './server.mjs';

/**
 * Open lots (with their conductors and samples) and a usable balance and rule. Samples
 * with a live resistance reading are left out: the bench posts the claimed metal's mass,
 * and on a sample whose resistance found another metal (CCA sold as copper) the server
 * questions the pair (weight × resistance fits no conductor metal, issue 13) with a 422.
 */
function openLots(dbPath, limit) {
  const db = new Database(dbPath, { readonly: true });
  const open = `select id from lots where status in ('on_hold', 'inspecting', 'awaiting_decision')
                 order by id desc limit ${Number(limit)}`;
  const conductors = db
    .prepare(
      `select l.id as lot_id, cs.id as conductor_id, cs.nominal_area_mm2, cs.claimed_material,
              json_extract(l.sampling_plan, '$.sampleSize') as units from lots l
         join conductor_specs cs on cs.product_id = l.product_id and cs.active = 1
        where l.id in (${open}) and not exists (select 1 from samples s where s.lot_id = l.id)`,
    )
    .all();
  const samples = db
    .prepare(
      `select s.id, cs.nominal_area_mm2 as areaMm2, cs.claimed_material as material,
              ${PER_SAMPLE} - (select count(*) from readings r
                                where r.sample_id = s.id and r.voided = 0) as room
         from samples s
         join conductor_specs cs on cs.id = s.conductor_id where s.lot_id in (${open})
          and not exists (select 1 from readings r where r.sample_id = s.id and r.voided = 0
                            and r.method = 'resistance')`,
    )
    .all();
  const instrument = (kind) =>
    db
      .prepare(
        'select id from instruments where kind = ? and active = 1 order by calibration_due_on desc',
      )
      .get(kind).id;
  const instruments = [instrument('balance'), instrument('length_rule')];
  db.close();
  return { conductors, samples, instruments };
}

/** Live readings one sample may hold (apps/backend reading-writer.ts, issue 17 item 10). */
export const PER_SAMPLE = 20;

/** Samples already cut on open lots with room for readings, and a usable balance and rule. */
export function openSamples(dbPath) {
  const { samples, instruments } = openLots(dbPath, 300);
  const withRoom = samples.filter((s) => s.room > 0);
  if (withRoom.length === 0) throw new Error('the data set has no sample with room on an open lot');
  return { samples: withRoom, instruments };
}

/**
 * The samples the load writes to: the samples already cut on open lots, and new ones (every
 * planned unit of each conductor of the open lots not cut yet) created through the API
 * until the samples have room for `needed` readings under the per-sample cap.
 */
async function prepareSamples(base, token, dbPath, needed) {
  const { conductors, samples: cut, instruments } = openLots(dbPath, 300);
  const samples = cut.filter((s) => s.room > 0);
  let room = samples.reduce((sum, s) => sum + s.room, 0);
  for (const c of conductors) {
    for (let seq = 1; seq <= c.units && room < needed; seq++) {
      const res = await fetch(`${base}/api/lots/${c.lot_id}/samples`, {
        method: 'POST',
        headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
        body: JSON.stringify({ conductorId: c.conductor_id, seq, unitRef: 'Bench unit' }),
      });
      if (res.status !== 201) {
        throw new Error(`POST /api/lots/${c.lot_id}/samples: ${res.status} ${await res.text()}`);
      }
      samples.push({
        id: (await res.json()).id,
        areaMm2: c.nominal_area_mm2,
        material: c.claimed_material,
        room: PER_SAMPLE,
      });
      room += PER_SAMPLE;
    }
  }
  if (samples.length === 0) throw new Error('readings: the data set has no open lot');
  return { samples, instruments };
}

/** The next sample of `list` (round robin) with room for a reading, its room taken. */
export function sampleWithRoom(list, state = { i: 0 }) {
  for (let n = 0; n < list.length; n++) {
    const s = list[state.i++ % list.length];
    if (s.room > 0) {
      s.room--;
      return s;
    }
  }
  throw new Error(`readings: every prepared sample holds ${PER_SAMPLE} readings`);
}

/**
 * One mass reading's body: 1000 mm of the sample's nominal area of its claimed metal, a
 * little scatter (copper's mass on a CCA conductor is a reading the server now questions).
 */
export function readingBody(s, i, instruments) {
  const density = (MATERIALS[s.material] ?? MATERIALS.copper).densityGPerCm3 / 1000;
  // ASTM B496's 2 % lay increment.
  const massG = Math.round(s.areaMm2 * density * 1000 * 1.02 * (0.99 + (i % 7) / 200) * 100) / 100;
  return JSON.stringify({
    method: 'mass',
    massG,
    lengthMm: 1000,
    strandingIncrement: 0.02,
    instrumentIds: instruments,
  });
}

/**
 * Mass readings posted round-robin under load, through the API on half of the prepared
 * samples and through the raw server (raw-readings-server.mjs) on the other half, so each
 * starts from samples in the same state, the two in turns (load.mjs inTurns). `apiOnly` skips
 * the raw server.
 */
export async function readingsPhase({
  base,
  token,
  dbPath,
  seconds,
  connections,
  clerkId,
  apiOnly,
}) {
  // Room for a generous 2 000 readings a second on each half, plus the backup's one a second.
  const needed = 2 * 2000 * seconds + 600;
  const { samples, instruments } = await prepareSamples(base, token, dbPath, needed);
  const half = (odd) => samples.filter((_, k) => k % 2 === (odd ? 1 : 0) || samples.length === 1);
  const requests = (list, prefix) => {
    const state = { i: 0 };
    return () => {
      const s = sampleWithRoom(list, state);
      const i = state.i;
      return {
        method: 'POST',
        path: `${prefix}/samples/${s.id}/readings`,
        body: readingBody(s, i, instruments),
      };
    };
  };
  const checked = (name, r) => {
    if (r.failed)
      throw new Error(`${name}: ${r.failed} failed answers ${JSON.stringify(r.statuses)}`);
    return r;
  };
  const apiLoad = {
    url: base,
    connections,
    headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
    nextRequest: requests(half(false), '/api'),
  };
  if (apiOnly) {
    return { api: checked('readings', await load({ ...apiLoad, seconds })), samples, instruments };
  }
  const port = await freePort();
  const child = await startRaw('raw-readings-server.mjs', [dbPath, String(port), String(clerkId)]);
  try {
    const [api, raw] = await inTurns(
      [
        apiLoad,
        {
          url: `http://127.0.0.1:${port}`,
          connections,
          headers: { 'content-type': 'application/json' },
          nextRequest: requests(half(true), ''),
        },
      ],
      { seconds },
    );
    checked('readings', api);
    checked('raw readings', raw);
    return { api, raw, samples, instruments };
  } finally {
    child.kill('SIGTERM');
  }
}

/** Downloads a CSV, counting data rows as they stream in (never holding the file). */
async function downloadCsv(base, path, token) {
  const t0 = performance.now();
  const res = await fetch(`${base}${path}`, { headers: { authorization: `Bearer ${token}` } });
  if (!res.ok) throw new Error(`GET ${path}: ${res.status} ${(await res.text()).slice(0, 300)}`);
  let lines = 0;
  let bytes = 0;
  const decoder = new TextDecoder();
  for await (const chunk of res.body) {
    bytes += chunk.length;
    const text = decoder.decode(chunk, { stream: true });
    for (let k = text.indexOf('\n'); k !== -1; k = text.indexOf('\n', k + 1)) lines++;
  }
  return { rows: Math.max(0, lines - 1), bytes, ms: performance.now() - t0 };
}

/** The return with the most lots and the supplier with the most readings. */
function exportTargets(dbPath) {
  const db = new Database(dbPath, { readonly: true });
  const ret = db
    .prepare(
      'select vendor_return_id as id, count(*) as n from vendor_return_lots group by 1 order by 2 desc, 1 limit 1',
    )
    .get();
  const supplier = db
    .prepare(
      'select supplier_id as id, count(*) as n from lots group by 1 order by 2 desc, 1 limit 1',
    )
    .get();
  db.close();
  if (!ret) throw new Error('exports: the data set has no return');
  return { returnId: ret.id, supplierId: supplier.id };
}

/**
 * The return's CSV (it is small) through the API and by the raw ceiling in turns, one call
 * each, until each side has had a second of work and five calls (in turns, so both meet
 * the same load from outside on a shared machine); then the whole reading history of the
 * busiest supplier, twice each in turns; the server's VmHWM.
 */
export async function exportsPhase({ base, token, dbPath, pid }) {
  const { returnId, supplierId } = exportTargets(dbPath);
  const raw = rawExports(dbPath, { returnId, supplierId });
  try {
    const ret = { rows: 0, ms: 0, calls: 0 };
    const rawRet = { rows: 0, ms: 0, calls: 0 };
    const enough = (side) => side.calls >= 5 && (side.ms >= 1000 || side.calls >= 200);
    while (!enough(ret) || !enough(rawRet)) {
      const one = await downloadCsv(base, `/api/returns/${returnId}/export.csv`, token);
      if (one.rows === 0) throw new Error(`return ${returnId} export has no rows`);
      ret.rows += one.rows;
      ret.ms += one.ms;
      ret.calls++;
      const twin = await raw.returnOnce();
      rawRet.rows += twin.rows;
      rawRet.ms += twin.ms;
      rawRet.calls++;
    }
    // The supplier's file twice each, in turns (API, raw, API, raw): one call each was at
    // the mercy of whatever else the machine did in its few seconds.
    const supplier = { rows: 0, ms: 0, calls: 0 };
    const rawSup = { rows: 0, ms: 0, calls: 0 };
    let peakMb = 0;
    for (let i = 0; i < 2; i++) {
      const one = await downloadCsv(
        base,
        `/api/suppliers/${supplierId}/readings/export.csv`,
        token,
      );
      if (one.rows === 0) throw new Error(`supplier ${supplierId} readings export has no rows`);
      supplier.rows += one.rows;
      supplier.ms += one.ms;
      supplier.calls++;
      // The server's peak before the raw export: that runs in this process, not the server's.
      peakMb = peakRssMb(pid);
      const twin = await raw.supplierOnce();
      rawSup.rows += twin.rows;
      rawSup.ms += twin.ms;
      rawSup.calls++;
    }
    if (
      Math.round(rawRet.rows / rawRet.calls) !== Math.round(ret.rows / ret.calls) ||
      rawSup.rows !== supplier.rows
    ) {
      console.error(
        `  note: raw exports wrote ${rawRet.rows / rawRet.calls} and ${rawSup.rows / rawSup.calls} rows, the API ${ret.rows / ret.calls} and ${supplier.rows / supplier.calls}`,
      );
    }
    return {
      raw: {
        returnRowsPerS: rawRet.rows / (rawRet.ms / 1000),
        returnRows: rawRet.rows / rawRet.calls,
        supplierRowsPerS: rawSup.rows / (rawSup.ms / 1000),
        supplierRows: rawSup.rows / rawSup.calls,
      },
      returnRowsPerS: ret.rows / (ret.ms / 1000),
      returnRows: ret.rows / ret.calls,
      supplierRowsPerS: supplier.rows / (supplier.ms / 1000),
      supplierRows: supplier.rows / supplier.calls,
      peakMb,
    };
  } finally {
    raw.close();
  }
}
