import AddOutlined from '@mui/icons-material/AddOutlined';
import RemoveCircleOutlined from '@mui/icons-material/RemoveCircleOutlined';
import { Box, Button, IconButton, MenuItem, TextField, Typography } from '@mui/material';
import { Controller, useFieldArray, useWatch, type Control } from 'react-hook-form';
import { EMPTY_CONDUCTOR, type ProductInput } from '@/features/products/api/create-product';
import { previewGauge } from '@/features/products/product-rules';
import {
  CLAIMED_MATERIALS,
  CONDUCTOR_PURPOSES,
  materialLabels,
  purposeLabels,
} from '@/features/products/types';
import { useUnits } from '@/lib/units';

function GaugeHelper({ control, index }: { control: Control<ProductInput>; index: number }) {
  const { formatAreaMm2 } = useUnits();
  const label = useWatch({ control, name: `conductors.${index}.gauge` });
  const preview = previewGauge(label ?? '');
  if (!preview.ok) return null;
  return (
    <>
      {preview.gauge.label} · nominal {formatAreaMm2(preview.gauge.nominalAreaMm2)}
    </>
  );
}

/** The conductors of a product: one for a spool, several for a kit. */
/** The conductor list; `disabled` for those who may not change conductor specs. */
export function ConductorFields({
  control,
  disabled = false,
}: {
  control: Control<ProductInput>;
  disabled?: boolean;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: 'conductors' });
  return (
    <Box component="fieldset" sx={{ border: 0, p: 0, m: 0, mt: 2 }}>
      <Typography component="legend" variant="subtitle1" sx={{ fontWeight: 600 }}>
        Conductors
      </Typography>
      {fields.map((field, index) => (
        <Box
          key={field.id}
          role="group"
          aria-label={`Conductor ${index + 1}`}
          sx={{
            display: 'grid',
            gridTemplateColumns: { xs: '1fr', md: '160px minmax(180px, 1fr) 190px 160px 40px' },
            columnGap: 1.5,
            alignItems: 'start',
          }}
        >
          <Controller
            control={control}
            name={`conductors.${index}.purpose`}
            render={({ field: f }) => (
              <TextField select label="Purpose" {...f} disabled={disabled}>
                {CONDUCTOR_PURPOSES.map((p) => (
                  <MenuItem key={p} value={p}>
                    {purposeLabels[p]}
                  </MenuItem>
                ))}
              </TextField>
            )}
          />
          <Controller
            control={control}
            name={`conductors.${index}.gauge`}
            render={({ field: f, fieldState }) => (
              <TextField
                label="Label gauge"
                placeholder="4 AWG, 1/0, 25 mm²"
                {...f}
                disabled={disabled}
                error={!!fieldState.error}
                helperText={
                  fieldState.error?.message ?? <GaugeHelper control={control} index={index} />
                }
              />
            )}
          />
          <Controller
            control={control}
            name={`conductors.${index}.claimedMaterial`}
            render={({ field: f }) => (
              <TextField select label="Claimed material" {...f} disabled={disabled}>
                {CLAIMED_MATERIALS.map((m) => (
                  <MenuItem key={m} value={m}>
                    {materialLabels[m]}
                  </MenuItem>
                ))}
              </TextField>
            )}
          />
          <Controller
            control={control}
            name={`conductors.${index}.claimedStrands`}
            render={({ field: f, fieldState }) => (
              <TextField
                label="Claimed strands"
                inputMode="numeric"
                {...f}
                disabled={disabled}
                error={!!fieldState.error}
                helperText={fieldState.error?.message}
              />
            )}
          />
          <IconButton
            aria-label={`Remove conductor ${index + 1}`}
            disabled={disabled || fields.length === 1}
            onClick={() => remove(index)}
            sx={{ mt: { md: 2 } }}
          >
            <RemoveCircleOutlined />
          </IconButton>
        </Box>
      ))}
      <Button
        disabled={disabled}
        startIcon={<AddOutlined />}
        onClick={() =>
          append({ ...EMPTY_CONDUCTOR, purpose: fields.length === 1 ? 'ground' : 'remote' })
        }
      >
        Add conductor
      </Button>
    </Box>
  );
}
