// Hand-written SQL for the comparisons: the scorecard aggregates and the lot list query,
// run through better-sqlite3 on the same file the server uses (SQLite dialect is fine here).
import { AWG_SIZES, METRIC_SIZES } from '@gaugeproof/standards';

/** Size ranks (larger = thicker) as a VALUES list: AWG −n, metric series position. */
const RANKS = [
  ...AWG_SIZES.map((g) => ['awg', g.label, -(g.awg ?? 0)]),
  ...METRIC_SIZES.map((g, i) => ['metric', g.label, i]),
];
const RANK_VALUES = RANKS.map(([s, l, r]) => `('${s}', '${l.replace(/'/g, "''")}', ${r})`).join(
  ', ',
);

/** The scorecard list of a range [start, end) in epoch ms: the same seven aggregates. */
export function scorecardsRaw(db, { start, end, today }) {
  const month = `strftime('%Y-%m', l.received_at / 1000, 'unixepoch')`;
  const suppliers = db.prepare('select id, name, code, status from suppliers order by name').all();
  const lots = db
    .prepare(
      `select l.supplier_id, ${month} as month, count(*) as lots,
              sum(l.status = 'accepted') as accepted,
              sum(l.status = 'accepted_on_concession') as concession,
              sum(l.status in ('rejected', 'returned')) as rejected
         from lots l where l.received_at >= ? and l.received_at < ?
        group by l.supplier_id, month`,
    )
    .all(start, end);
  // Aggregated per label pair first, so the size ranks are looked up once per pair.
  const readings = db
    .prepare(
      `with ranks(system, label, rank) as (values ${RANK_VALUES}),
       pairs as (
         select l.supplier_id, ${month} as month, r.method, cs.gauge_system, cs.gauge_label,
                r.measures_as, count(*) as n, sum(r.area_ratio) as sum_ratio, min(r.area_ratio) as min_ratio
           from readings r
           join samples s on s.id = r.sample_id
           join lots l on l.id = s.lot_id
           join conductor_specs cs on cs.id = s.conductor_id
          where r.voided = 0 and l.received_at >= ? and l.received_at < ?
          group by 1, 2, 3, 4, 5, 6)
       select p.supplier_id, p.month, p.method, sum(p.n) as readings, sum(p.sum_ratio) as sum_ratio,
              min(p.min_ratio) as min_ratio, max(lr.rank - mr.rank) as worst_short
         from pairs p
         left join ranks lr on lr.system = p.gauge_system and lr.label = p.gauge_label
         left join ranks mr on mr.system = p.gauge_system and mr.label = p.measures_as
        group by p.supplier_id, p.month, p.method`,
    )
    .all(start, end);
  // Units (a sample's seq in its lot): nonconforming when any of its conductors is.
  const units = db
    .prepare(
      `select u.supplier_id, count(*) as tested, sum(u.nc) as nonconforming
         from (select l.supplier_id, s.lot_id, s.seq, max(ps.nc) as nc
                 from (select r.sample_id, max(r.verdict = 'nonconforming') as nc
                         from readings r join samples s0 on s0.id = r.sample_id
                         join lots l0 on l0.id = s0.lot_id
                        where r.voided = 0 and l0.received_at >= ? and l0.received_at < ?
                        group by r.sample_id) ps
                 join samples s on s.id = ps.sample_id
                 join lots l on l.id = s.lot_id
                group by l.supplier_id, s.lot_id, s.seq) u
        group by u.supplier_id`,
    )
    .all(start, end);
  const samples = db
    .prepare(
      `select l.supplier_id, cs.purpose, count(*) as tested, sum(ps.nc) as nonconforming,
              sum(ps.mm) as mismatches
         from (select r.sample_id, max(r.verdict = 'nonconforming') as nc,
                      max(r.material_mismatch = 1) as mm
                 from readings r where r.voided = 0 group by r.sample_id) ps
         join samples s on s.id = ps.sample_id
         join lots l on l.id = s.lot_id
         join conductor_specs cs on cs.id = s.conductor_id
        where l.received_at >= ? and l.received_at < ?
        group by l.supplier_id, cs.purpose`,
    )
    .all(start, end);
  const cars = db
    .prepare(
      `select supplier_id, sum(status <> 'closed') as open_count,
              sum(status in ('open', 'reopened') and due_on < ?) as overdue,
              avg(case when responded_at is not null and created_at >= ? and created_at < ?
                       then responded_at - created_at end) as mean_ms
         from corrective_actions group by supplier_id`,
    )
    .all(today, start, end);
  const chargebacks = db
    .prepare(
      `select supplier_id, currency, sum(chargeback_total) as total from vendor_returns
        where status <> 'cancelled' and created_at >= ? and created_at < ?
        group by supplier_id, currency`,
    )
    .all(start, end);
  return { suppliers, lots, readings, units, samples, cars, chargebacks };
}

/**
 * The lot list: status filter, text filter, newest first, written as the lots service
 * writes it: supplier names and SKUs looked up in their tables, PO, packing slip and
 * supplier lot code matched by their start, and (`walk`, when the statuses hold a large
 * share of the lots) the status test kept off the indexes so the page walks received-at.
 */
export function lotListQuery({ statuses, q, page, pageSize, walk }) {
  const escaped = q
    .trim()
    .toLowerCase()
    .replace(/[\\%_]/g, (c) => `\\${c}`);
  const any = `%${escaped}%`;
  const start = `${escaped}%`;
  const like = (col) => `lower(${col}) like ? escape '\\'`;
  const text = [
    `l.supplier_id in (select id from suppliers where ${like('name')})`,
    `l.product_id in (select id from products where ${like('sku')})`,
    like('l.po_number'),
    like('l.packing_slip'),
    like('l.supplier_lot_code'),
  ].join(' or ');
  const status = walk ? "coalesce(l.status, '')" : 'l.status';
  const where = `${status} in (${statuses.map(() => '?').join(', ')}) and (${text})`;
  const bindings = [...statuses, any, any, start, start, start];
  const from = `from lots l join products p on p.id = l.product_id join suppliers s on s.id = l.supplier_id`;
  return {
    items: {
      sql: `select l.id, l.status, l.po_number, l.packing_slip, l.supplier_lot_code, l.quantity,
                   l.unit, l.received_at, l.sampling_plan, l.version, u.id as received_by_id,
                   u.name as received_by_name, p.id as product_id, p.sku, p.description, p.kind,
                   s.id as supplier_id, s.name as supplier_name, s.code, s.status as supplier_status
              ${from} join users u on u.id = l.received_by_id
             where ${where} order by l.received_at desc, l.id desc limit ? offset ?`,
      bindings: [...bindings, pageSize, (page - 1) * pageSize],
    },
    count: { sql: `select count(*) as n from lots l where ${where}`, bindings },
    share: {
      sql: `select (select count(*) from lots where status in (${statuses.map(() => '?').join(', ')})) * 1.0 /
                   max(1, (select count(*) from lots)) as share`,
      bindings: statuses,
    },
  };
}
