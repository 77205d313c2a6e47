import { Link, Stack } from '@mui/material';
import { useMemo } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';
import { CsvDownloadButton } from '@/components/data-table/csv-download-button';
import { createDataTableColumnHelper, DataTable } from '@/components/data-table/data-table';
import { useListParams } from '@/components/data-table/use-list-params';
import { paths } from '@/config/paths';
import { useLots } from '@/features/lots/api/get-lots';
import { LotStatusChip } from '@/features/lots/components/lot-status-chip';
import { LOT_FILTERS, LotsFilters, parseStatuses } from '@/features/lots/components/lots-filters';
import type { LotListParams } from '@/lib/lots-api';
import type { LotSummary } from '@/features/lots/types';
import { formatDate } from '@/lib/dates';

const helper = createDataTableColumnHelper<LotSummary>();

const columns = helper.columns([
  helper.accessor('id', {
    header: 'Lot',
    cell: (info) => (
      <Link
        component={RouterLink}
        to={paths.lot.getHref(info.getValue())}
        onClick={(e) => e.stopPropagation()}
      >
        {info.getValue()}
      </Link>
    ),
  }),
  helper.accessor('receivedAt', {
    header: 'Received',
    enableSorting: true,
    cell: (info) => formatDate(info.getValue()),
  }),
  helper.accessor('status', {
    header: 'Status',
    enableSorting: true,
    cell: (info) => <LotStatusChip status={info.getValue()} />,
  }),
  helper.accessor('poNumber', { header: 'PO', enableSorting: true }),
  helper.accessor((lot) => lot.supplier.name, {
    id: 'supplier',
    header: 'Supplier',
    enableSorting: true,
  }),
  helper.accessor((lot) => lot.product.sku, { id: 'product', header: 'Product' }),
  helper.accessor('quantity', {
    header: 'Quantity',
    enableSorting: true,
    cell: (info) => `${info.getValue()} ${info.row.original.unit}`,
  }),
  helper.accessor((lot) => lot.samplingPlan.sampleSize, { id: 'plan', header: 'Units to cut' }),
]);

export function LotsTable() {
  const navigate = useNavigate();
  const list = useListParams({
    filters: LOT_FILTERS,
    defaultSort: { field: 'receivedAt', direction: 'desc' },
  });
  const params = useMemo<LotListParams>(() => {
    const f = list.filters;
    return {
      status: parseStatuses(f.status),
      supplierId: f.supplierId ? Number(f.supplierId) : undefined,
      productId: f.productId ? Number(f.productId) : undefined,
      receivedFrom: f.receivedFrom || undefined,
      receivedTo: f.receivedTo || undefined,
      q: f.q || undefined,
      page: list.page,
      pageSize: list.pageSize,
      sort: list.sort ? `${list.sort.field}:${list.sort.direction}` : undefined,
    };
  }, [list.filters, list.page, list.pageSize, list.sort]);
  const lots = useLots(params);

  return (
    <Stack spacing={2}>
      <Stack direction="row" sx={{ justifyContent: 'flex-end' }}>
        <CsvDownloadButton path="/lots/export.csv" query={list.query} filename="lots.csv" />
      </Stack>
      <LotsFilters filters={list.filters} setFilter={list.setFilter} setFilters={list.setFilters} />
      <DataTable
        label="Lots"
        columns={columns}
        data={lots.data}
        loading={lots.isFetching}
        error={lots.error}
        onRetry={() => void lots.refetch()}
        emptyMessage="No lot matches these filters."
        getRowId={(lot) => String(lot.id)}
        onRowClick={(lot) => void navigate(paths.lot.getHref(lot.id))}
        {...list.tableProps}
      />
    </Stack>
  );
}
