import { InputAdornment, Stack, Typography } from '@mui/material';
import type { Control, FieldValues, Path } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { COST_FIELDS, costsFromForm, type CostsForm } from '@/features/returns/api/cost-schema';
import { chargebackTotal, formatMoney } from '@/features/returns/lib/chargeback';

type CostName = keyof CostsForm;

/** The cost fields' paths in a form holding `costs`, where the server's messages land. */
export const COST_PATHS = COST_FIELDS.map((name) => `costs.${name}` as const);

interface CostFieldsProps<T extends FieldValues & { costs: CostsForm }, O> {
  control: Control<T, unknown, O>;
  /** The form's current costs (watched), for the live total. */
  costs: CostsForm;
  /** ISO 4217 code of the amounts; a new return takes the server's default. */
  currency?: string;
}

/** The chargeback's parts with the total worked out as they are typed. */
export function CostFields<T extends FieldValues & { costs: CostsForm }, O>({
  control,
  costs,
  currency,
}: CostFieldsProps<T, O>) {
  const total = chargebackTotal(costsFromForm(costs));
  const field = (name: CostName, label: string, unit?: string) => (
    <FormTextField
      control={control}
      name={`costs.${name}` as Path<T>}
      label={label}
      inputMode="decimal"
      helperText=" "
      slotProps={
        unit
          ? { input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } }
          : undefined
      }
      sx={{ flex: 1, minWidth: 130 }}
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
