import AddOutlined from '@mui/icons-material/AddOutlined';
import { Alert, Button, Paper } from '@mui/material';
import { useCallback, useState } from 'react';
import {
  FilterBar,
  FilterBarSpacer,
  FilterSelect,
  optionsOf,
} from '@/components/data-table/filter-bar';
import { useListParams } from '@/components/data-table/use-list-params';
import { useInstruments } from '@/features/instruments/api/get-instruments';
import { useUpdateInstrument } from '@/features/instruments/api/update-instrument';
import { InstrumentDialog } from '@/features/instruments/components/instrument-dialog';
import { InstrumentsTable } from '@/features/instruments/components/instruments-table';
import { INSTRUMENT_KINDS, kindLabels, type Instrument } from '@/features/instruments/types';
import { toasts } from '@/lib/toast-store';

const CALIBRATION_OPTIONS = [
  { value: '14', label: 'Due within 14 days or overdue' },
  { value: '0', label: 'Overdue or due today' },
];
const SERVICE_OPTIONS = [
  { value: 'true', label: 'In service' },
  { value: 'false', label: 'Retired' },
];

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
        <FilterSelect
          label="Kind"
          value={list.filters.kind}
          onChange={(kind) => list.setFilter('kind', kind)}
          options={optionsOf(INSTRUMENT_KINDS, kindLabels)}
          width={200}
        />
        <FilterSelect
          label="Calibration"
          allLabel="Any"
          value={list.filters.dueWithinDays}
          onChange={(days) => list.setFilter('dueWithinDays', days)}
          options={CALIBRATION_OPTIONS}
          width={280}
        />
        <FilterSelect
          label="In service"
          value={list.filters.active}
          onChange={(active) => list.setFilter('active', active)}
          options={SERVICE_OPTIONS}
          width={160}
        />
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
