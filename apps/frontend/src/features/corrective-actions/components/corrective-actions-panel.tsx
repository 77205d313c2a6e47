import AddTaskOutlined from '@mui/icons-material/AddTaskOutlined';
import { Box, Button, Checkbox, FormControlLabel, Paper } from '@mui/material';
import { useState } from 'react';
import { CsvDownloadButton } from '@/components/data-table/csv-download-button';
import { FilterBar, FilterSelect, optionsOf } from '@/components/data-table/filter-bar';
import { useListParams } from '@/components/data-table/use-list-params';
import { useCorrectiveActions } from '@/features/corrective-actions/api/get-corrective-actions';
import { CorrectiveActionsTable } from '@/features/corrective-actions/components/corrective-actions-table';
import { NewCorrectiveActionDialog } from '@/features/corrective-actions/components/new-corrective-action-dialog';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { CAR_STATUSES, carStatusLabels } from '@/features/corrective-actions/types';

const STATUS_OPTIONS = [
  { value: 'open,responded,verified,reopened', label: 'Not closed' },
  ...optionsOf(CAR_STATUSES, carStatusLabels),
];

export function CorrectiveActionsPanel() {
  const list = useListParams({
    filters: ['status', 'supplierId', 'overdue'],
    defaultSort: { field: 'dueOn', direction: 'asc' },
  });
  const cars = useCorrectiveActions(list.query);
  const [creating, setCreating] = useState(false);
  const filtered = !!(list.filters.status || list.filters.supplierId || list.filters.overdue);

  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <FilterBar>
        <FilterSelect
          label="Status"
          showAll={false}
          value={list.filters.status}
          onChange={(status) => list.setFilter('status', status)}
          options={STATUS_OPTIONS}
          width={180}
        />
        <SupplierSelect
          allowAll
          value={list.filters.supplierId ? Number(list.filters.supplierId) : null}
          onChange={(id) => list.setFilter('supplierId', id ? String(id) : '')}
        />
        <FormControlLabel
          control={
            <Checkbox
              checked={list.filters.overdue === 'true'}
              onChange={(e) => list.setFilter('overdue', e.target.checked ? 'true' : '')}
            />
          }
          label="Overdue only"
          sx={{ whiteSpace: 'nowrap' }}
        />
        {/* The two commands stay together at the right, on the next line if need be. */}
        <Box sx={{ display: 'flex', gap: 2, ml: 'auto' }}>
          <CsvDownloadButton
            path="/corrective-actions/export.csv"
            query={list.query}
            filename="corrective-actions.csv"
          />
          <Button
            variant="contained"
            startIcon={<AddTaskOutlined />}
            onClick={() => setCreating(true)}
          >
            New SCAR
          </Button>
        </Box>
      </FilterBar>
      <CorrectiveActionsTable
        {...list.tableProps}
        data={cars.data}
        loading={cars.isFetching}
        error={cars.error}
        onRetry={() => void cars.refetch()}
        emptyMessage={
          filtered
            ? 'No corrective action matches these filters.'
            : 'No corrective action requested yet.'
        }
      />
      {creating && <NewCorrectiveActionDialog onClose={() => setCreating(false)} />}
    </Paper>
  );
}
