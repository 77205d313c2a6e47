import {
  Alert,
  Box,
  Button,
  LinearProgress,
  Skeleton,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TablePagination,
  TableRow,
  TableSortLabel,
  Typography,
} from '@mui/material';
import {
  createColumnHelper,
  functionalUpdate,
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type ColumnHelper,
  type RowData,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import { useMemo, type ReactNode } from 'react';
import { PAGE_SIZES, type ListSort } from '@/components/data-table/use-list-params';
import type { Page } from '@gaugeproof/api-types';

/** Paging and sorting happen on the server; the table only renders and reports. */
export const dataTableFeatures = tableFeatures({ rowSortingFeature, rowPaginationFeature });
export type DataTableFeatures = typeof dataTableFeatures;

/**
 * Column helper for DataTable. A column sorts (on the server) only with
 * `enableSorting: true`; its id (the accessor key, or `id`) is the server's sort field.
 */
export const createDataTableColumnHelper = <T extends RowData>() =>
  createColumnHelper<DataTableFeatures, T>();
export type DataTableColumns<T extends RowData> = ReturnType<
  ColumnHelper<DataTableFeatures, T>['columns']
>;

/**
 * The last column of a register for a user who may edit it: an "Edit" button on each row.
 * None without `onEdit`, so the table shows no command the user may not use.
 */
export function editColumns<T extends RowData>(onEdit: ((row: T) => void) | undefined) {
  if (!onEdit) return [];
  return [
    createDataTableColumnHelper<T>().display({
      id: 'actions',
      header: '',
      cell: ({ row }) => (
        <Button size="small" onClick={() => onEdit(row.original)}>
          Edit
        </Button>
      ),
    }),
  ];
}

export interface DataTableProps<T extends RowData> {
  /** Accessible name of the table ("Suppliers"). */
  label: string;
  columns: DataTableColumns<T>;
  /** One page of a list answer (its page and pageSize are the list state's). */
  data: Pick<Page<T>, 'items' | 'total'> | undefined;
  /** True while a request for this view is in flight. */
  loading: boolean;
  error: unknown;
  onRetry?: () => void;
  /** Shown when the server answers with no rows ("No supplier matches these filters."). */
  emptyMessage: ReactNode;
  getRowId: (row: T) => string;
  onRowClick?: (row: T) => void;
  /** 1-based page. */
  page: number;
  pageSize: number;
  sort: ListSort | null;
  onPageChange: (page: number) => void;
  onPageSizeChange: (pageSize: number) => void;
  onSortChange: (sort: ListSort | null) => void;
}

const noRows: never[] = [];
const defaultColumn = { enableSorting: false };

function errorText(error: unknown): string {
  return error instanceof Error ? error.message : 'The list could not be loaded.';
}

export function DataTable<T extends RowData>(props: DataTableProps<T>) {
  const { columns, data, loading, error, page, pageSize, sort, onSortChange } = props;
  const sorting = useMemo<SortingState>(
    () => (sort ? [{ id: sort.field, desc: sort.direction === 'desc' }] : []),
    [sort],
  );

  const table = useTable({
    features: dataTableFeatures,
    columns,
    data: data?.items ?? (noRows as T[]),
    getRowId: props.getRowId,
    defaultColumn,
    manualSorting: true,
    manualPagination: true,
    enableMultiSort: false,
    rowCount: data?.total ?? 0,
    state: { sorting, pagination: { pageIndex: page - 1, pageSize } },
    onSortingChange: (updater: Updater<SortingState>) => {
      const [first] = functionalUpdate(updater, sorting);
      onSortChange(first ? { field: first.id, direction: first.desc ? 'desc' : 'asc' } : null);
    },
  });

  const columnCount = table.getAllLeafColumns().length;
  const rows = table.getRowModel().rows;

  return (
    <Box>
      {error ? (
        <Alert
          severity="error"
          sx={{ mb: 1 }}
          action={
            props.onRetry ? (
              <Button color="inherit" size="small" onClick={props.onRetry}>
                Retry
              </Button>
            ) : undefined
          }
        >
          {errorText(error)}
        </Alert>
      ) : null}
      <Box sx={{ height: 4 }}>{loading ? <LinearProgress aria-label="Loading" /> : null}</Box>
      <TableContainer>
        <Table size="small" aria-label={props.label} aria-busy={loading}>
          <TableHead>
            {table.getHeaderGroups().map((group) => (
              <TableRow key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <TableCell
                      key={header.id}
                      sortDirection={sorted || false}
                      sx={{ fontWeight: 600, whiteSpace: 'nowrap' }}
                    >
                      {header.isPlaceholder ? null : header.column.getCanSort() ? (
                        <TableSortLabel
                          active={sorted !== false}
                          direction={sorted || 'asc'}
                          onClick={header.column.getToggleSortingHandler()}
                        >
                          <table.FlexRender header={header} />
                        </TableSortLabel>
                      ) : (
                        <table.FlexRender header={header} />
                      )}
                    </TableCell>
                  );
                })}
              </TableRow>
            ))}
          </TableHead>
          <TableBody>
            {rows.map((row) => (
              <TableRow
                key={row.id}
                hover
                onClick={props.onRowClick ? () => props.onRowClick?.(row.original) : undefined}
                sx={props.onRowClick ? { cursor: 'pointer' } : undefined}
              >
                {row.getAllCells().map((cell) => (
                  <TableCell key={cell.id}>
                    <table.FlexRender cell={cell} />
                  </TableCell>
                ))}
              </TableRow>
            ))}
            {!data && loading
              ? Array.from({ length: 3 }, (_, i) => (
                  <TableRow key={`skeleton-${i}`}>
                    <TableCell colSpan={columnCount}>
                      <Skeleton />
                    </TableCell>
                  </TableRow>
                ))
              : null}
            {data && data.items.length === 0 ? (
              <TableRow>
                <TableCell colSpan={columnCount}>
                  <Typography color="text.secondary" sx={{ py: 2, textAlign: 'center' }}>
                    {props.emptyMessage}
                  </Typography>
                </TableCell>
              </TableRow>
            ) : null}
          </TableBody>
        </Table>
      </TableContainer>
      <TablePagination
        component="div"
        count={data?.total ?? 0}
        page={data && data.total > 0 ? page - 1 : 0}
        rowsPerPage={pageSize}
        rowsPerPageOptions={[...PAGE_SIZES]}
        onPageChange={(_event, next) => props.onPageChange(next + 1)}
        onRowsPerPageChange={(event) => props.onPageSizeChange(Number(event.target.value))}
      />
    </Box>
  );
}
