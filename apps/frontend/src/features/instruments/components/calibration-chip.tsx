import { Chip } from '@mui/material';
import type { Instrument } from '@/features/instruments/types';
import { formatCalendarDate } from '@/lib/dates';

/** Calibration status (ISO 9001 7.1.5): ok, due within 14 days, or overdue. */
export function CalibrationChip({ instrument }: { instrument: Instrument }) {
  const due = formatCalendarDate(instrument.calibrationDueOn);
  switch (instrument.calibrationStatus) {
    case 'overdue':
      return <Chip size="small" color="error" label={`Overdue since ${due}`} />;
    case 'due_soon':
      return (
        <Chip
          size="small"
          color="warning"
          label={
            instrument.daysToDue === 0
              ? `Due today`
              : `Due in ${instrument.daysToDue} day${instrument.daysToDue === 1 ? '' : 's'}`
          }
        />
      );
    case 'ok':
      return <Chip size="small" color="success" variant="outlined" label="Calibrated" />;
  }
}
