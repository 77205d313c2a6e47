import AssignmentReturnOutlined from '@mui/icons-material/AssignmentReturnOutlined';
import { Button, Paper } from '@mui/material';
import { useSearchParams } from 'react-router';
import { CsvDownloadButton } from '@/components/data-table/csv-download-button';
import {
  FilterBar,
  FilterBarSpacer,
  FilterSelect,
  optionsOf,
} from '@/components/data-table/filter-bar';
import { useListParams } from '@/components/data-table/use-list-params';
import { useReturns } from '@/features/returns/api/get-returns';
import { NewReturnDialog } from '@/features/returns/components/new-return-dialog';
import { ReturnsTable } from '@/features/returns/components/returns-table';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { RETURN_STATUSES, returnStatusLabels } from '@/features/returns/types';

const positive = (v: string | null) => (v && /^\d+$/.test(v) && Number(v) > 0 ? Number(v) : null);

const STATUS_OPTIONS = [
  { value: 'draft,emailed,shipped,acknowledged,credited', label: 'Open (not closed or cancelled)' },
  ...optionsOf(RETURN_STATUSES, returnStatusLabels),
];

/** Returns to vendor with their filters; `?raiseLot=&raiseSupplier=` opens the new-return form. */
export function ReturnsPanel() {
  const list = useListParams({
    filters: ['status', 'supplierId', 'new'],
    defaultSort: { field: 'createdAt', direction: 'desc' },
  });
  const { new: _new, ...query } = list.query;
  const returns = useReturns(query);
  const [search, setSearch] = useSearchParams();
  const raiseLot = positive(search.get('raiseLot'));
  const raiseSupplier = positive(search.get('raiseSupplier'));
  const raising = raiseLot !== null && raiseSupplier !== null;
  const open = raising || list.filters.new === '1';

  const close = () =>
    setSearch(
      (prev) => {
        const next = new URLSearchParams(prev);
        ['raiseLot', 'raiseSupplier', 'new'].forEach((k) => next.delete(k));
        return next;
      },
      { replace: true },
    );

  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <FilterBar>
        <FilterSelect
          label="Status"
          showAll={false}
          value={list.filters.status}
          onChange={(status) => list.setFilter('status', status)}
          options={STATUS_OPTIONS}
          width={200}
        />
        <SupplierSelect
          allowAll
          value={positive(list.filters.supplierId)}
          onChange={(id) => list.setFilter('supplierId', id ? String(id) : '')}
        />
        <FilterBarSpacer />
        <CsvDownloadButton path="/returns/export.csv" query={query} filename="returns.csv" />
        <Button
          variant="contained"
          startIcon={<AssignmentReturnOutlined />}
          onClick={() => list.setFilter('new', '1')}
        >
          New return
        </Button>
      </FilterBar>
      <ReturnsTable
        {...list.tableProps}
        data={returns.data}
        loading={returns.isFetching}
        error={returns.error}
        onRetry={() => void returns.refetch()}
        emptyMessage={
          list.filters.status || list.filters.supplierId
            ? 'No return matches these filters.'
            : 'No return raised yet. Raise one from a rejected lot or with “New return”.'
        }
      />
      {open && (
        <NewReturnDialog
          onClose={close}
          initial={raising ? { lotId: raiseLot, supplierId: raiseSupplier } : undefined}
        />
      )}
    </Paper>
  );
}
