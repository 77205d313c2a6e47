import { InputAdornment, MenuItem, TextField } from '@mui/material';
import { MATERIAL_IDS, MATERIALS, type MaterialId } from '@gaugeproof/standards';
import type { ReactNode } from 'react';

interface CalcFieldProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  unit?: string;
  error?: string;
  helperText?: ReactNode;
  inputMode?: 'decimal' | 'numeric' | 'text';
}

/** A calculator input: text, so nothing typed is lost, with its unit beside it. */
export function CalcField({
  label,
  value,
  onChange,
  unit,
  error,
  helperText,
  inputMode = 'decimal',
}: CalcFieldProps) {
  return (
    <TextField
      label={label}
      value={value}
      onChange={(event) => onChange(event.target.value)}
      error={!!error}
      helperText={error ?? helperText}
      slotProps={{
        htmlInput: { inputMode },
        input: unit
          ? { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> }
          : undefined,
      }}
      sx={{ mt: 0 }}
    />
  );
}

export function MaterialField(props: {
  label: string;
  value: MaterialId;
  onChange: (value: MaterialId) => void;
}) {
  return (
    <TextField
      select
      label={props.label}
      value={props.value}
      onChange={(event) => props.onChange(event.target.value as MaterialId)}
      sx={{ mt: 0 }}
    >
      {MATERIAL_IDS.map((id) => (
        <MenuItem key={id} value={id}>
          {MATERIALS[id].name}
        </MenuItem>
      ))}
    </TextField>
  );
}
