// The exports' ceiling: the same readings read with better-sqlite3 in one statement and
// written through the server's own CSV writer (apps/backend/dist/exports/readings-csv.js)
// to a stream that discards them. What the API adds on top is its framework, the ORM's
// query builder, the keyset pages, the audit events and the HTTP stream.
import { once } from 'node:events';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { Writable } from 'node:stream';
import Database from 'better-sqlite3';

const require = createRequire(import.meta.url);
const { csvHeader, csvLines } = require(
  join(import.meta.dirname, '..', '..', 'apps/backend/dist/exports/readings-csv.js'),
);
const { instrumentsText } = require(
  join(import.meta.dirname, '..', '..', 'apps/backend/dist/exports/readings-export.query.js'),
);

// The lot's papers as the server's export reads them: its newest return not cancelled (the
// exported one for a return) and its newest NCR.
const RTV = (only) => `(select vr.number || char(31) || coalesce(vr.rma_number, '')
    from vendor_return_lots x join vendor_returns vr on vr.id = x.vendor_return_id
    where x.lot_id = l.id and ${only} order by vr.id desc limit 1) as rtv`;
const NCR = `(select n.number from nonconformances n where n.lot_id = l.id order by n.id desc limit 1) as ncr`;
const COLUMNS = `r.id, s.lot_id, s.seq, s.unit_ref, cs.purpose, cs.gauge_label, r.method, r.inputs,
  r.instruments, r.four_wire, r.confirmed_unusual, r.area_mm2, r.u_mm2, r.expanded_umm2,
  r.area_ratio, r.measures_as, r.identified_material, r.verdict, r.taken_at, r.voided,
  r.void_reason, l.po_number, l.supplier_lot_code, l.packing_slip, su.name as supplier_name,
  p.sku, l.received_at, ${NCR}`;
const FROM = `from lots l join samples s on s.lot_id = l.id join readings r on r.sample_id = s.id
  join conductor_specs cs on cs.id = s.conductor_id join products p on p.id = l.product_id
  join suppliers su on su.id = l.supplier_id`;

const SQL = {
  supplier: `select ${COLUMNS}, ${RTV(`vr.status <> 'cancelled'`)} ${FROM}
            where l.supplier_id = ? order by l.id, r.id`,
  return: `select ${COLUMNS}, ${RTV('vr.id = vrl.vendor_return_id')} ${FROM}
            join vendor_return_lots vrl on vrl.lot_id = l.id
            where vrl.vendor_return_id = ? order by l.id, r.id`,
};

const shaped = (r) => {
  const [rtvNumber, rmaNumber] = r.rtv ? r.rtv.split('\u001f') : [null, null];
  return {
    id: r.id,
    lotId: r.lot_id,
    poNumber: r.po_number,
    supplierLotCode: r.supplier_lot_code,
    packingSlip: r.packing_slip,
    rtvNumber,
    rmaNumber: rmaNumber || null,
    ncrNumber: r.ncr,
    supplier: r.supplier_name,
    sku: r.sku,
    receivedAt: new Date(r.received_at),
    seq: r.seq,
    unitRef: r.unit_ref,
    purpose: r.purpose,
    gaugeLabel: r.gauge_label,
    method: r.method,
    inputs: JSON.parse(r.inputs),
    instruments: instrumentsText(r.instruments),
    fourWire: r.four_wire === null ? null : r.four_wire === 1,
    confirmedUnusual: r.confirmed_unusual === 1,
    areaMm2: r.area_mm2,
    uMm2: r.u_mm2,
    expandedUMm2: r.expanded_umm2,
    areaRatio: r.area_ratio,
    measuresAs: r.measures_as,
    identifiedMaterial: r.identified_material,
    verdict: r.verdict,
    takenAt: new Date(r.taken_at),
    voided: r.voided === 1,
    voidReason: r.void_reason,
  };
};

/** One export of a scope to a discarding stream, in blocks of 1 000 rows; rows written. */
async function exportOnce(stmt, id) {
  const sink = new Writable({ write: (_chunk, _enc, done) => done() });
  const write = async (text) => {
    if (!sink.write(text)) await once(sink, 'drain');
  };
  await write(csvHeader());
  let block = [];
  let rows = 0;
  for (const r of stmt.iterate(id)) {
    block.push(shaped(r));
    if (block.length === 1000) {
      await write(csvLines(block));
      rows += block.length;
      block = [];
    }
  }
  if (block.length) await write(csvLines(block));
  rows += block.length;
  sink.end();
  return rows;
}

/**
 * The ceiling on one file: `returnOnce()` writes the return's CSV once (rows, ms),
 * `supplierOnce()` the supplier's; `close()` when done.
 */
export function rawExports(dbPath, { returnId, supplierId }) {
  const db = new Database(dbPath, { readonly: true, fileMustExist: true });
  const retStmt = db.prepare(SQL.return);
  const supStmt = db.prepare(SQL.supplier);
  const timed = async (stmt, id) => {
    const t0 = performance.now();
    const rows = await exportOnce(stmt, id);
    return { rows, ms: performance.now() - t0 };
  };
  return {
    returnOnce: () => timed(retStmt, returnId),
    supplierOnce: () => timed(supStmt, supplierId),
    close: () => db.close(),
  };
}
