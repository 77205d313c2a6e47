import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { toQueryString } from '@/components/data-table/use-list-params';
import type { AuditFacets, Page } from '@gaugeproof/api-types';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';
import type { TimelineEvent } from '@/features/audit/types';

/** GET /api/audit (admin): page, pageSize, sort, entityType, entityId, action, actorId, from, to. */
export type AuditListParams = Record<string, string>;

export type { AuditFacets };

export const auditEventsQueryOptions = (params: AuditListParams) =>
  queryOptions({
    queryKey: queryKeys.audit.list(params),
    queryFn: ({ signal }) => api.get<Page<TimelineEvent>>(`/audit${toQueryString(params)}`, signal),
    placeholderData: keepPreviousData,
  });

export const useAuditEvents = (params: AuditListParams) =>
  useQuery(auditEventsQueryOptions(params));

/** The actions, record types and people that occur in the trail, for the filters. */
export const useAuditFacets = () =>
  useQuery({
    queryKey: queryKeys.audit.facets(),
    queryFn: ({ signal }) => api.get<AuditFacets>('/audit/facets', signal),
    staleTime: 60_000,
  });
