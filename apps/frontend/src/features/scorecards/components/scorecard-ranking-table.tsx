import { Box, Link, Stack, Tooltip, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import { useMemo } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';
import {
  createDataTableColumnHelper,
  DataTable,
  type DataTableColumns,
} from '@/components/data-table/data-table';
import { useListParams } from '@/components/data-table/use-list-params';
import { paths } from '@/config/paths';
import { useScorecards } from '@/features/scorecards/api/get-scorecards';
import { SupplierStatusChip } from '@/features/scorecards/components/supplier-status-chip';
import TrendSparkline from '@/features/scorecards/components/trend-sparkline';
import {
  formatMoneyTotals,
  formatPercent,
  formatWhole,
  NONE,
} from '@/features/scorecards/lib/format';
import { rankRows } from '@/features/scorecards/lib/rank-rows';
import type { DateRange, ScorecardRow } from '@/features/scorecards/types';

const col = createDataTableColumnHelper<ScorecardRow>();
const sortable = { enableSorting: true };

/**
 * A header that may wrap onto two lines (the table's headers do not by default): the
 * ranking's eleven columns fit a 1366 px screen beside the navigation only when the long
 * ones wrap (checked in e2e/scorecards.e2e.mjs).
 */
const wrapping = (text: string) => (): ReactNode => (
  <Box component="span" sx={{ whiteSpace: 'normal', display: 'inline-block', maxWidth: '6.5em' }}>
    {text}
  </Box>
);

const scorecardHref = (supplierId: number, range: DateRange) =>
  `${paths.supplierScorecard.getHref(supplierId)}?from=${range.from}&to=${range.to}`;

const columnsFor = (range: DateRange): DataTableColumns<ScorecardRow> =>
  col.columns([
    col.accessor('name', {
      header: 'Supplier',
      ...sortable,
      cell: ({ row }) => (
        <Stack spacing={0.5} sx={{ minWidth: 140, maxWidth: 200, alignItems: 'flex-start' }}>
          <Link
            component={RouterLink}
            to={scorecardHref(row.original.supplierId, range)}
            onClick={(e) => e.stopPropagation()}
            sx={{ fontWeight: 600 }}
          >
            {row.original.name}
          </Link>
          <Stack
            direction="row"
            spacing={0.5}
            useFlexGap
            sx={{ alignItems: 'center', flexWrap: 'wrap' }}
          >
            <Typography variant="caption" color="text.secondary">
              {row.original.code}
            </Typography>
            <SupplierStatusChip status={row.original.status} />
          </Stack>
        </Stack>
      ),
    }),
    col.accessor('lotsReceived', { header: 'Lots', ...sortable }),
    col.accessor('acceptanceRate', {
      header: 'Accepted',
      ...sortable,
      cell: ({ row }) => (
        <Tooltip
          title={`${row.original.lotsAccepted} accepted, ${row.original.lotsAcceptedOnConcession} on concession, ${row.original.lotsRejected} rejected, ${row.original.lotsPending} undecided`}
        >
          <span>{formatPercent(row.original.acceptanceRate)}</span>
        </Tooltip>
      ),
    }),
    col.display({
      id: 'trend',
      header: 'Trend',
      cell: ({ row }) => <TrendSparkline trend={row.original.trend} name={row.original.name} />,
    }),
    col.accessor('dppm', {
      header: wrapping('Nonconf. units ppm'),
      ...sortable,
      cell: ({ row, getValue }) => (
        <Tooltip
          title={`${row.original.nonconformingUnits} of ${row.original.unitsTested} units nonconforming (a kit with one short conductor is one unit)`}
        >
          <span>{formatWhole(getValue())}</span>
        </Tooltip>
      ),
    }),
    col.accessor('meanAreaRatio', {
      header: 'Mean area',
      ...sortable,
      cell: ({ row, getValue }) => (
        <Tooltip
          title={
            row.original.areaRatioByMethod
              .map((m) => `${m.method}: ${formatPercent(m.meanAreaRatio)} (${m.readings})`)
              .join(', ') || 'no readings'
          }
        >
          <span>{formatPercent(getValue())}</span>
        </Tooltip>
      ),
    }),
    col.accessor('lowestAreaRatio', {
      header: 'Lowest',
      ...sortable,
      cell: ({ getValue }) => formatPercent(getValue()),
    }),
    col.accessor('materialMismatches', { header: wrapping('CCA / Al found') }),
    col.accessor('worstSizesShort', {
      header: wrapping('Sizes short'),
      cell: ({ getValue }) => getValue() ?? NONE,
    }),
    col.accessor('openCorrectiveActions', {
      header: wrapping('Open SCARs'),
      ...sortable,
      cell: ({ row }) =>
        row.original.overdueCorrectiveActions > 0
          ? `${row.original.openCorrectiveActions} (${row.original.overdueCorrectiveActions} overdue)`
          : row.original.openCorrectiveActions,
    }),
    col.accessor('chargebacks', {
      header: 'Chargebacks',
      ...sortable,
      // One line per currency: amounts in different currencies are never added together.
      cell: ({ getValue }) => {
        const lines = formatMoneyTotals(getValue());
        if (lines.length === 0) return NONE;
        return (
          <Stack component="span" sx={{ whiteSpace: 'nowrap' }}>
            {lines.map((line) => (
              <span key={line}>{line}</span>
            ))}
          </Stack>
        );
      },
    }),
  ]);

/** Suppliers ranked worst first (the server's order) unless a column is sorted. */
export default function ScorecardRankingTable({ range }: { range: DateRange }) {
  const navigate = useNavigate();
  const list = useListParams({ filters: [] });
  const query = useScorecards(range);
  const columns = useMemo(() => columnsFor(range), [range]);
  const data = useMemo(
    () =>
      query.data ? rankRows(query.data.items, list.sort, list.page, list.pageSize) : undefined,
    [query.data, list.sort, list.page, list.pageSize],
  );
  return (
    // Narrower cell padding than the table's default (16 px a side): eleven columns fit
    // 1366 px beside the navigation.
    <Box sx={{ '& .MuiTableCell-root': { px: 1 } }}>
      <DataTable
        label="Supplier ranking"
        columns={columns}
        data={data}
        loading={query.isFetching}
        error={query.error}
        onRetry={() => void query.refetch()}
        emptyMessage="No supplier is registered yet."
        getRowId={(row) => String(row.supplierId)}
        onRowClick={(row) => navigate(scorecardHref(row.supplierId, range))}
        {...list.tableProps}
      />
    </Box>
  );
}
