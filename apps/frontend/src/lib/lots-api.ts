import { queryOptions } from '@tanstack/react-query';
import type { LotDetail, LotSummary, Page, TimelineEvent } from '@gaugeproof/api-types';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

/**
 * The lot reads of the API in one module, so every feature asks for a lot, a page of lots
 * or a lot's timeline with the same request under the same key (lib/query-keys.ts): one
 * cache entry per lot, refreshed once. The answers are the contract's shapes (libs/api-types).
 */

/** Filters of GET /api/lots and its CSV export (docs/api-conventions.md). */
export interface LotFilters {
  status?: readonly string[];
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

/** GET /api/lots: one page of lots. */
export const getLots = (params: LotListParams, signal?: AbortSignal) =>
  api.get<Page<LotSummary>>(`/lots${lotQueryString(params)}`, signal);

export const lotsQueryOptions = (params: LotListParams) =>
  queryOptions({
    queryKey: queryKeys.lots.list(params),
    queryFn: ({ signal }) => getLots(params, signal),
  });

/** GET /api/lots/:id: the Lot page's read model (lot, samples, readings, photos, decisions). */
export const getLot = (id: number, signal?: AbortSignal) =>
  api.get<LotDetail>(`/lots/${id}`, signal);

export const lotQueryOptions = (id: number) =>
  queryOptions({
    queryKey: queryKeys.lots.detail(id),
    queryFn: ({ signal }) => getLot(id, signal),
  });

/** GET /api/lots/:id/timeline: the lot's audit events, oldest first. */
export const lotTimelineQueryOptions = (lotId: number) =>
  queryOptions({
    queryKey: queryKeys.lots.timeline(lotId),
    queryFn: ({ signal }) => api.get<TimelineEvent[]>(`/lots/${lotId}/timeline`, signal),
  });
