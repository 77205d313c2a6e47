import { Button, Stack } from '@mui/material';
import { useMemo } from 'react';
import {
  DataTable,
  createDataTableColumnHelper,
  type DataTableProps,
} from '@/components/data-table/data-table';
import { CalibrationChip } from '@/features/instruments/components/calibration-chip';
import { kindLabels, unitLabels, type Instrument } from '@/features/instruments/types';
import { formatCalendarDate } from '@/lib/dates';

const helper = createDataTableColumnHelper<Instrument>();

type InstrumentsTableProps = Omit<DataTableProps<Instrument>, 'columns' | 'label' | 'getRowId'> & {
  onEdit?: (instrument: Instrument) => void;
  onToggleActive?: (instrument: Instrument) => void;
};

export function InstrumentsTable({ onEdit, onToggleActive, ...props }: InstrumentsTableProps) {
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor('name', { header: 'Name', enableSorting: true }),
        helper.accessor('kind', {
          header: 'Kind',
          enableSorting: true,
          cell: (info) => kindLabels[info.getValue()],
        }),
        helper.accessor('serial', { header: 'Serial', enableSorting: true }),
        helper.accessor('resolution', {
          header: 'Resolution',
          cell: ({ row }) =>
            `${row.original.resolution} ${unitLabels[row.original.resolutionUnit]}`,
        }),
        helper.display({
          id: 'accuracy',
          header: 'Accuracy · certificate U',
          cell: ({ row }) => {
            const i = row.original;
            const unit = unitLabels[i.resolutionUnit];
            const parts = [
              i.accuracyPercentOfReading != null ? `±${i.accuracyPercentOfReading} %` : '',
              i.accuracyAbsolute != null ? `±${i.accuracyAbsolute} ${unit}` : '',
            ].filter(Boolean);
            const stated = parts.length ? parts.join(' + ') : 'not stated';
            const cal =
              i.calibrationUncertainty != null ? `U ${i.calibrationUncertainty} ${unit}` : 'no U';
            return `${stated} · ${cal}`;
          },
        }),
        helper.accessor('calibratedOn', {
          header: 'Calibrated',
          cell: (info) => formatCalendarDate(info.getValue()),
        }),
        helper.accessor('calibrationDueOn', {
          header: 'Calibration',
          enableSorting: true,
          cell: ({ row }) =>
            row.original.active ? <CalibrationChip instrument={row.original} /> : 'Retired',
        }),
        ...(onEdit && onToggleActive
          ? [
              helper.display({
                id: 'actions',
                header: '',
                cell: ({ row }) => (
                  <Stack direction="row" spacing={1}>
                    <Button size="small" onClick={() => onEdit(row.original)}>
                      Edit
                    </Button>
                    <Button
                      size="small"
                      color={row.original.active ? 'error' : 'primary'}
                      onClick={() => onToggleActive(row.original)}
                    >
                      {row.original.active ? 'Retire' : 'Reinstate'}
                    </Button>
                  </Stack>
                ),
              }),
            ]
          : []),
      ]),
    [onEdit, onToggleActive],
  );
  return (
    <DataTable
      {...props}
      label="Instruments"
      columns={columns}
      getRowId={(instrument) => String(instrument.id)}
    />
  );
}
