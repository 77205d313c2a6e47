import { DomainError } from '../common/domain-error';
import { addDays } from '../common/calendar';
import { likePattern, parseSort } from '../common/paging';
import type { LotFiltersDto } from './dto/list-lots.dto';
import { LIST_COLUMNS } from './lot-summary';

export const LOT_SORTS = ['receivedAt', 'poNumber', 'status', 'supplier', 'quantity'] as const;
export type LotSort = (typeof LOT_SORTS)[number];
const SORT_COLUMNS: Record<LotSort, string> = {
  receivedAt: 'l.received_at',
  poNumber: 'l.po_number',
  status: 'l.status',
  supplier: 's.name',
  quantity: 'l.quantity',
};

/** The list's sort as [field, direction]; a field it cannot sort by is a 400. */
export function lotSort(q: LotFiltersDto): [LotSort, 'asc' | 'desc'] {
  const [field, dir] = parseSort(q.sort, LOT_SORTS, ['receivedAt', 'desc']);
  return [field, dir ?? 'asc'];
}

/** A WHERE clause with `?` placeholders and its values, in order. */
export interface LotFilterSql {
  readonly where: string;
  readonly bindings: readonly unknown[];
}

/**
 * The lot list's filters as plain, portable SQL over `lots l` (aliases p and s are not
 * needed: names and SKUs are looked up in their own small tables). `walkByDate`: the
 * status test is written so no index can serve it (`coalesce` of a NOT NULL column, the
 * same rows on every database), see LotsService.walkInReceivedOrder.
 *
 * Written out rather than built by MikroORM's query builder on every request: cloning and
 * compiling the builder took a fifth of an uncached lot-list request (measured with
 * --cpu-prof on the 50 000-lot bench set), and its SQL carried the values in its text, so
 * each page size and offset was a statement SQLite compiled anew.
 */
export function lotFilterSql(q: LotFiltersDto, walkByDate = false): LotFilterSql {
  if (q.receivedFrom && q.receivedTo && q.receivedTo < q.receivedFrom) {
    throw DomainError.invalid([
      { field: 'receivedTo', message: 'receivedTo must not be before receivedFrom' },
    ]);
  }
  const terms: string[] = [];
  const bindings: unknown[] = [];
  if (q.status?.length) {
    const column = walkByDate ? "coalesce(l.status, '')" : 'l.status';
    terms.push(`${column} in (${q.status.map(() => '?').join(', ')})`);
    bindings.push(...q.status);
  }
  if (q.supplierId) {
    terms.push('l.supplier_id = ?');
    bindings.push(q.supplierId);
  }
  if (q.productId) {
    terms.push('l.product_id = ?');
    bindings.push(q.productId);
  }
  if (q.receivedFrom) {
    terms.push('l.received_at >= ?');
    bindings.push(new Date(`${q.receivedFrom}T00:00:00Z`));
  }
  if (q.receivedTo) {
    terms.push('l.received_at < ?');
    bindings.push(new Date(`${addDays(q.receivedTo, 1)}T00:00:00Z`));
  }
  if (q.q?.trim()) {
    // Names and SKUs match anywhere and are looked up once in their small tables; PO,
    // packing slip and supplier lot code match by their start, as a clerk types them.
    const any = likePattern(q.q);
    const start = any.slice(1);
    const like = (col: string) => `lower(${col}) like ? escape '\\'`;
    terms.push(
      `(${[
        `l.supplier_id in (select id from suppliers where ${like('name')})`,
        `l.product_id in (select id from products where ${like('sku')})`,
        like('l.po_number'),
        like('l.packing_slip'),
        like('l.supplier_lot_code'),
      ].join(' or ')})`,
    );
    bindings.push(any, any, start, start, start);
  }
  return { where: terms.length ? `where ${terms.join(' and ')}` : '', bindings };
}

/** How many lots the filters match. */
export function lotCountSql(filter: LotFilterSql): { sql: string; bindings: unknown[] } {
  return {
    sql: `select count(*) as n from lots l ${filter.where}`,
    bindings: [...filter.bindings],
  };
}

/** A page of LIST_COLUMNS rows in the list's sort, the lot id breaking ties. */
export function lotPageSql(
  filter: LotFilterSql,
  [field, dir]: [LotSort, 'asc' | 'desc'],
  limit: number,
  offset: number,
): { sql: string; bindings: unknown[] } {
  return {
    sql: `select ${LIST_COLUMNS.join(', ')}
            from lots l
            join products p on p.id = l.product_id
            join suppliers s on s.id = l.supplier_id
            join users u on u.id = l.received_by_id
           ${filter.where}
           order by ${SORT_COLUMNS[field]} ${dir}, l.id ${dir}
           limit ? offset ?`,
    bindings: [...filter.bindings, limit, offset],
  };
}
