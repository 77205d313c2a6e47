import { ListItemText, MenuItem, TextField } from '@mui/material';
import type { InstrumentSlot } from '@/features/inspection/lib/reading-methods';
import type { Instrument } from '@/features/inspection/types';

interface InstrumentPickerProps {
  slot: InstrumentSlot;
  instruments: readonly Instrument[];
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  error?: string;
}

/** Active instruments of the right kind; one past its calibration due date is shown but cannot be chosen. */
export function InstrumentPicker({
  slot,
  instruments,
  value,
  onChange,
  onBlur,
  error,
}: InstrumentPickerProps) {
  const options = instruments.filter((i) => i.active && slot.kinds.includes(i.kind));
  const none =
    options.length === 0 ? `No active ${slot.label.toLowerCase()} in the register.` : undefined;
  return (
    <TextField
      select
      label={slot.label}
      required={slot.required}
      value={value}
      onChange={(e) => onChange(e.target.value)}
      onBlur={onBlur}
      error={!!error}
      helperText={error ?? none}
      sx={{ minWidth: 220 }}
    >
      {!slot.required && <MenuItem value="">Not recorded</MenuItem>}
      {options.map((i) => (
        <MenuItem key={i.id} value={String(i.id)} disabled={i.calibrationStatus === 'overdue'}>
          <ListItemText
            primary={`${i.name} (${i.serial})`}
            secondary={
              i.calibrationStatus === 'overdue'
                ? `Calibration overdue since ${i.calibrationDueOn}`
                : `Resolution ${i.resolution} ${i.resolutionUnit === 'degC' ? '°C' : i.resolutionUnit === 'mohm' ? 'mΩ' : i.resolutionUnit === 'ohm' ? 'Ω' : i.resolutionUnit} · due ${i.calibrationDueOn}`
            }
          />
        </MenuItem>
      ))}
    </TextField>
  );
}
