import { InputAdornment, Stack, TextField, Typography } from '@mui/material';
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';
import { costsFromForm, type CostsForm } from '@/features/returns/api/cost-schema';
import { chargebackTotal, formatMoney } from '@/features/returns/lib/chargeback';

type CostName = keyof CostsForm;

interface CostFieldsProps {
  /** The form's current costs (watched), for the live total. */
  costs: CostsForm;
  /** ISO 4217 code of the amounts; a new return takes the server's default. */
  currency?: string;
  register: (name: CostName) => UseFormRegisterReturn;
  errors: Partial<Record<CostName, FieldError>> | undefined;
}

/** The chargeback's parts with the total worked out as they are typed. */
export function CostFields({ costs, currency, register, errors }: CostFieldsProps) {
  const total = chargebackTotal(costsFromForm(costs));
  const field = (name: CostName, label: string, unit?: string) => (
    <TextField
      label={label}
      inputMode="decimal"
      error={!!errors?.[name]}
      helperText={errors?.[name]?.message ?? ' '}
      slotProps={
        unit
          ? { input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } }
          : undefined
      }
      sx={{ flex: 1, minWidth: 130 }}
      {...register(name)}
    />
  );
  return (
    <Stack spacing={1} component="fieldset" sx={{ border: 0, p: 0, m: 0 }}>
      <Typography component="legend" variant="subtitle2">
        Chargeback
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        {field('inspectionHours', 'Inspection hours', 'h')}
        {field('hourlyRate', 'Hourly rate')}
        {field('freight', 'Freight')}
        {field('other', 'Other')}
      </Stack>
      <Typography role="status" aria-label="Chargeback total">
        Chargeback total:{' '}
        <strong>
          {currency ? formatMoney(total, currency) : `${total.toFixed(2)} (shop currency)`}
        </strong>
        <Typography component="span" variant="body2" color="text.secondary">
          {' '}
          (hours × rate + freight + other)
        </Typography>
      </Typography>
    </Stack>
  );
}
