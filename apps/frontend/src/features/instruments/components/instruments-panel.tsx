import AddOutlined from '@mui/icons-material/AddOutlined';
import { Alert, Button, MenuItem, Paper, TextField } from '@mui/material';
import { useCallback, useState } from 'react';
import { FilterBar, FilterBarSpacer, allOptionProps } from '@/components/data-table/filter-bar';
import { useListParams } from '@/components/data-table/use-list-params';
import { useInstruments } from '@/features/instruments/api/get-instruments';
import { useUpdateInstrument } from '@/features/instruments/api/update-instrument';
import { InstrumentDialog } from '@/features/instruments/components/instrument-dialog';
import { InstrumentsTable } from '@/features/instruments/components/instruments-table';
import { INSTRUMENT_KINDS, kindLabels, type Instrument } from '@/features/instruments/types';
import { toasts } from '@/lib/toast-store';

export function InstrumentsPanel({ canWrite }: { canWrite: boolean }) {
  const list = useListParams({
    filters: ['kind', 'active', 'dueWithinDays'],
    defaultSort: { field: 'calibrationDueOn', direction: 'asc' },
  });
  const instruments = useInstruments(list.query);
  const [editing, setEditing] = useState<Instrument | 'new' | null>(null);
  const { mutate: update } = useUpdateInstrument();

  const onToggleActive = useCallback(
    (i: Instrument) =>
      update(
        { id: i.id, version: i.version, patch: { active: !i.active } },
        {
          onSuccess: () => toasts.success(`${i.name} ${i.active ? 'retired' : 'reinstated'}.`),
          onError: (error) => toasts.error(error.message),
        },
      ),
    [update],
  );

  const filtered = Boolean(list.filters.kind || list.filters.active || list.filters.dueWithinDays);
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      {!canWrite && (
        <Alert severity="info" sx={{ mb: 2 }}>
          The QA lead keeps this register. Readings with an overdue instrument are refused.
        </Alert>
      )}
      <FilterBar>
        <TextField
          select
          label="Kind"
          {...allOptionProps}
          value={list.filters.kind}
          onChange={(e) => list.setFilter('kind', e.target.value)}
          sx={{ width: 200 }}
        >
          <MenuItem value="">All</MenuItem>
          {INSTRUMENT_KINDS.map((k) => (
            <MenuItem key={k} value={k}>
              {kindLabels[k]}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          select
          label="Calibration"
          {...allOptionProps}
          value={list.filters.dueWithinDays}
          onChange={(e) => list.setFilter('dueWithinDays', e.target.value)}
          sx={{ width: 280 }}
        >
          <MenuItem value="">Any</MenuItem>
          <MenuItem value="14">Due within 14 days or overdue</MenuItem>
          <MenuItem value="0">Overdue or due today</MenuItem>
        </TextField>
        <TextField
          select
          label="In service"
          {...allOptionProps}
          value={list.filters.active}
          onChange={(e) => list.setFilter('active', e.target.value)}
          sx={{ width: 160 }}
        >
          <MenuItem value="">All</MenuItem>
          <MenuItem value="true">In service</MenuItem>
          <MenuItem value="false">Retired</MenuItem>
        </TextField>
        <FilterBarSpacer />
        {canWrite && (
          <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setEditing('new')}>
            New instrument
          </Button>
        )}
      </FilterBar>
      <InstrumentsTable
        {...list.tableProps}
        data={instruments.data}
        loading={instruments.isFetching}
        error={instruments.error}
        onRetry={() => void instruments.refetch()}
        emptyMessage={filtered ? 'No instrument matches these filters.' : 'No instruments yet.'}
        onEdit={canWrite ? setEditing : undefined}
        onToggleActive={canWrite ? onToggleActive : undefined}
      />
      {editing && (
        <InstrumentDialog
          instrument={editing === 'new' ? null : editing}
          onClose={() => setEditing(null)}
        />
      )}
    </Paper>
  );
}
