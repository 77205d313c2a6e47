import { AQLS, INSPECTION_LEVELS } from '@gaugeproof/standards';
import { InputAdornment, MenuItem, TextField } from '@mui/material';
import { Controller, type Control } from 'react-hook-form';
import { FormRow } from '@/features/products/components/form-row';
import type { ProductInput } from '@/features/products/api/create-product';

/**
 * Inspection policy: ISO 2859-1 level and AQL, and the minimum area ratio. `disabled` for
 * those who may not set acceptance criteria (the server refuses them too).
 */
export function InspectionPolicyFields({
  control,
  disabled = false,
}: {
  control: Control<ProductInput>;
  disabled?: boolean;
}) {
  return (
    <FormRow columns="1fr 1fr 1fr">
      <Controller
        control={control}
        name="inspectionLevel"
        render={({ field, fieldState }) => (
          <TextField
            select
            label="Inspection level"
            {...field}
            disabled={disabled}
            error={!!fieldState.error}
            helperText={
              fieldState.error?.message ??
              (field.value.startsWith('S-')
                ? 'Special level: samples are destroyed.'
                : 'General level: more samples are cut.')
            }
          >
            {INSPECTION_LEVELS.map((level) => (
              <MenuItem key={level} value={level}>
                {level}
              </MenuItem>
            ))}
          </TextField>
        )}
      />
      <Controller
        control={control}
        name="aql"
        render={({ field, fieldState }) => (
          <TextField
            select
            label="AQL"
            {...field}
            disabled={disabled}
            error={!!fieldState.error}
            helperText={fieldState.error?.message ?? 'Percent nonconforming (ISO 2859-1).'}
          >
            {AQLS.map((aql) => (
              <MenuItem key={aql} value={aql}>
                {aql}
              </MenuItem>
            ))}
          </TextField>
        )}
      />
      <Controller
        control={control}
        name="minAreaRatioPercent"
        render={({ field, fieldState }) => (
          <TextField
            label="Minimum area"
            inputMode="decimal"
            {...field}
            disabled={disabled}
            error={!!fieldState.error}
            helperText={fieldState.error?.message ?? 'Of nominal; ASTM B496 uses 98 %.'}
            slotProps={{
              input: { endAdornment: <InputAdornment position="end">%</InputAdornment> },
            }}
          />
        )}
      />
    </FormRow>
  );
}
