import { type SortDirection } from '@gaugeproof/api-types';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { PAGE_SIZE } from '@gaugeproof/api-types';

export { type SortDirection };
export interface ListSort {
  field: string;
  direction: SortDirection;
}

export interface ListParamsOptions<TFilter extends string> {
  /** Filter names kept in the URL, e.g. ['q', 'status']. */
  filters: readonly TFilter[];
  defaultSort?: ListSort | null;
  defaultPageSize?: number;
}

/** Page size choices; the server caps pageSize at 100 (docs/api-conventions.md). */
export const PAGE_SIZES = [10, 25, 50, 100] as const;

export interface ListParams<TFilter extends string> {
  page: number;
  pageSize: number;
  sort: ListSort | null;
  filters: Record<TFilter, string>;
  /** The request's query parameters: page, pageSize, sort 'field:dir' and non-empty filters. */
  query: Record<string, string>;
  setPage: (page: number) => void;
  setPageSize: (pageSize: number) => void;
  setSort: (sort: ListSort | null) => void;
  /** Sets one filter and goes back to page 1; an empty value removes it. */
  setFilter: (name: TFilter, value: string) => void;
  /**
   * Several filters in one change of the address (two `setFilter` calls in a row would
   * each start from the same address, and the second would undo the first).
   */
  setFilters: (changes: Partial<Record<TFilter, string>>) => void;
  /** Spread into <DataTable>: the paging and sorting props with their callbacks. */
  tableProps: {
    page: number;
    pageSize: number;
    sort: ListSort | null;
    onPageChange: (page: number) => void;
    onPageSizeChange: (pageSize: number) => void;
    onSortChange: (sort: ListSort | null) => void;
  };
}

export function parseSort(value: string | null): ListSort | null {
  if (!value) return null;
  const [field, direction] = value.split(':');
  if (!field || (direction !== 'asc' && direction !== 'desc')) return null;
  return { field, direction };
}

function positiveInt(value: string | null, fallback: number, max = Number.MAX_SAFE_INTEGER) {
  const n = Number(value);
  return Number.isInteger(n) && n >= 1 ? Math.min(n, max) : fallback;
}

/** Builds `?a=1&b=2` from a parameter record (for fetchers and CSV links). */
export function toQueryString(params: Record<string, string | number | undefined>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== '') search.set(key, String(value));
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}

/**
 * A list's page, page size, sort and filters kept in the URL search parameters, so that
 * reloading the page or following a shared link shows the same view.
 */
export function useListParams<TFilter extends string>({
  filters: filterNames,
  defaultSort = null,
  defaultPageSize = 25,
}: ListParamsOptions<TFilter>): ListParams<TFilter> {
  const [search, setSearch] = useSearchParams();
  const page = positiveInt(search.get('page'), 1);
  const pageSize = positiveInt(search.get('pageSize'), defaultPageSize, PAGE_SIZE.max);
  const sortParam = search.get('sort');
  const defaultSortText = defaultSort ? `${defaultSort.field}:${defaultSort.direction}` : '';
  const filterKey = filterNames.join(',');

  const update = useCallback(
    (changes: Record<string, string | null>, resetPage: boolean) =>
      setSearch(
        (previous) => {
          const next = new URLSearchParams(previous);
          for (const [key, value] of Object.entries(changes)) {
            if (value === null || value === '') next.delete(key);
            else next.set(key, value);
          }
          if (resetPage) next.delete('page');
          return next;
        },
        { replace: true },
      ),
    [setSearch],
  );

  return useMemo(() => {
    const sort = parseSort(sortParam ?? defaultSortText);
    const filters = {} as Record<TFilter, string>;
    for (const name of filterKey.split(',') as TFilter[]) filters[name] = search.get(name) ?? '';
    const sortText = sort ? `${sort.field}:${sort.direction}` : '';
    const query: Record<string, string> = { page: String(page), pageSize: String(pageSize) };
    if (sortText) query.sort = sortText;
    for (const [name, value] of Object.entries<string>(filters)) if (value) query[name] = value;

    const setPage = (next: number) => update({ page: next > 1 ? String(next) : null }, false);
    const setPageSize = (next: number) => update({ pageSize: String(next) }, true);
    // An explicit "no sort" is kept as sort= so the default does not come back.
    const setSort = (next: ListSort | null) => {
      const text = next ? `${next.field}:${next.direction}` : '';
      update({ sort: text === defaultSortText ? null : text || 'none' }, true);
    };
    const setFilter = (name: TFilter, value: string) => update({ [name]: value }, true);
    const setFilters = (changes: Partial<Record<TFilter, string>>) =>
      update(changes as Record<string, string>, true);
    return {
      page,
      pageSize,
      sort,
      filters,
      query,
      setPage,
      setPageSize,
      setSort,
      setFilter,
      setFilters,
      tableProps: {
        page,
        pageSize,
        sort,
        onPageChange: setPage,
        onPageSizeChange: setPageSize,
        onSortChange: setSort,
      },
    };
  }, [search, page, pageSize, sortParam, defaultSortText, filterKey, update]);
}
