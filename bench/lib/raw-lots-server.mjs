// The comparison server: node:http + better-sqlite3 answering the lot list query on the
// same file, with the LotSummary shape. Run as a child process: node raw-lots-server.mjs DB.
// Like the API it keeps the total and the status share per filter set, keyed by the
// database's change counters of the tables they are read from (read once per request, as
// the API's lots/lot-list-cache.ts does), so the two differ by framework and ORM, not by
// what they compute.
import { createServer } from 'node:http';
import Database from 'better-sqlite3';
import { lotListQuery } from './raw-sql.mjs';

const db = new Database(process.argv[2], { readonly: true, fileMustExist: true });
const cache = new Map();
const totals = new Map();
// The sum of the counters of lots, products and suppliers (apps/backend common/change-counters.ts).
const counted = db.prepare(
  "select sum(version) as v from change_counters where table_name in ('lots', 'products', 'suppliers')",
);
let generation = -1;
const remembered = (key, compute) => {
  if (!totals.has(key)) totals.set(key, compute());
  return totals.get(key);
};
const prepared = (sql) => {
  if (!cache.has(sql)) cache.set(sql, db.prepare(sql));
  return cache.get(sql);
};

const server = createServer((req, res) => {
  const url = new URL(req.url, 'http://localhost');
  const page = Number(url.searchParams.get('page') ?? 1);
  const pageSize = Number(url.searchParams.get('pageSize') ?? 25);
  const statuses = (url.searchParams.get('status') ?? '').split(',').filter(Boolean);
  const q = url.searchParams.get('q') ?? '';
  const now = Number(counted.get().v);
  if (now !== generation) {
    generation = now;
    totals.clear();
  }
  const probe = lotListQuery({ statuses, q, page, pageSize, walk: false });
  const share = remembered(
    `share ${statuses}`,
    () => prepared(probe.share.sql).get(...probe.share.bindings).share,
  );
  const query = lotListQuery({ statuses, q, page, pageSize, walk: share >= 0.25 });
  const rows = prepared(query.items.sql).all(...query.items.bindings);
  const total = remembered(
    `total ${statuses} ${q}`,
    () => prepared(query.count.sql).get(...query.count.bindings).n,
  );
  const items = rows.map((r) => ({
    id: r.id,
    status: r.status,
    poNumber: r.po_number,
    packingSlip: r.packing_slip,
    supplierLotCode: r.supplier_lot_code,
    quantity: r.quantity,
    unit: r.unit,
    receivedAt: new Date(r.received_at).toISOString(),
    receivedBy: { id: r.received_by_id, name: r.received_by_name },
    product: { id: r.product_id, sku: r.sku, description: r.description, kind: r.kind },
    supplier: { id: r.supplier_id, name: r.supplier_name, code: r.code, status: r.supplier_status },
    samplingPlan: JSON.parse(r.sampling_plan),
    version: r.version,
  }));
  res.writeHead(200, { 'content-type': 'application/json; charset=utf-8' });
  res.end(JSON.stringify({ items, total, page, pageSize }));
});
server.listen(Number(process.argv[3]), '127.0.0.1', () => process.send?.('ready'));
