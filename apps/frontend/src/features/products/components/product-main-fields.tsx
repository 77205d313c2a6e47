import { MenuItem, TextField } from '@mui/material';
import { Controller, useWatch, type Control } from 'react-hook-form';
import type { ProductInput } from '@/features/products/api/create-product';
import { FormRow } from '@/features/products/components/form-row';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { PRODUCT_KINDS, kindLabels } from '@/features/products/types';
import { useUnits } from '@/lib/units';

function LengthHelper({ control }: { control: Control<ProductInput> }) {
  const { system, formatLengthMm } = useUnits();
  const value = Number(useWatch({ control, name: 'lengthPerUnitM' }));
  if (system === 'metric' || !(value > 0)) return <>Cable per spool or per kit, in metres.</>;
  return <>= {formatLengthMm(value * 1000)}</>;
}

/** Supplier, SKU, kind, description and length per unit. */
/** `locked`: editing, when supplier, SKU and kind stay as created (lots are filed under them). */
export function ProductMainFields(props: { control: Control<ProductInput>; locked: boolean }) {
  const { control, locked } = props;
  return (
    <>
      <FormRow columns="2fr 1fr 1fr">
        <Controller
          control={control}
          name="supplierId"
          render={({ field, fieldState }) => (
            <SupplierSelect
              required
              value={field.value ? Number(field.value) : null}
              onChange={(id) => field.onChange(id === null ? '' : String(id))}
              disabled={locked}
              error={fieldState.error?.message}
            />
          )}
        />
        <Controller
          control={control}
          name="sku"
          render={({ field, fieldState }) => (
            <TextField
              label="SKU"
              {...field}
              disabled={locked}
              error={!!fieldState.error}
              helperText={fieldState.error?.message}
            />
          )}
        />
        <Controller
          control={control}
          name="kind"
          render={({ field }) => (
            <TextField select label="Kind" {...field} disabled={locked}>
              {PRODUCT_KINDS.map((k) => (
                <MenuItem key={k} value={k}>
                  {kindLabels[k]}
                </MenuItem>
              ))}
            </TextField>
          )}
        />
      </FormRow>
      <FormRow columns="3fr 1fr">
        <Controller
          control={control}
          name="description"
          render={({ field, fieldState }) => (
            <TextField
              label="Description"
              {...field}
              error={!!fieldState.error}
              helperText={fieldState.error?.message}
            />
          )}
        />
        <Controller
          control={control}
          name="lengthPerUnitM"
          render={({ field, fieldState }) => (
            <TextField
              label="Length per unit (m)"
              inputMode="decimal"
              {...field}
              error={!!fieldState.error}
              helperText={fieldState.error?.message ?? <LengthHelper control={control} />}
            />
          )}
        />
      </FormRow>
    </>
  );
}
