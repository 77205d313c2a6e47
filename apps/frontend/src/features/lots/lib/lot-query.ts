import type { LotStatus } from '@/features/lots/types';

/** Filters of GET /api/lots and its CSV export (docs/api-conventions.md). */
export interface LotFilters {
  status?: readonly LotStatus[];
  supplierId?: number;
  productId?: number;
  /** Calendar dates, YYYY-MM-DD. */
  receivedFrom?: string;
  receivedTo?: string;
  q?: string;
}

export interface LotListParams extends LotFilters {
  page?: number;
  pageSize?: number;
  /** `field:asc` or `field:desc`; fields receivedAt, poNumber, status, supplier, quantity. */
  sort?: string;
}

/** The query string for a lot list or export; empty filters are left out. */
export function lotQueryString(params: LotListParams): string {
  const search = new URLSearchParams();
  if (params.status && params.status.length > 0) search.set('status', params.status.join(','));
  if (params.supplierId !== undefined) search.set('supplierId', String(params.supplierId));
  if (params.productId !== undefined) search.set('productId', String(params.productId));
  if (params.receivedFrom) search.set('receivedFrom', params.receivedFrom);
  if (params.receivedTo) search.set('receivedTo', params.receivedTo);
  const q = params.q?.trim();
  if (q) search.set('q', q);
  if (params.page !== undefined) search.set('page', String(params.page));
  if (params.pageSize !== undefined) search.set('pageSize', String(params.pageSize));
  if (params.sort) search.set('sort', params.sort);
  const text = search.toString();
  return text === '' ? '' : `?${text}`;
}
