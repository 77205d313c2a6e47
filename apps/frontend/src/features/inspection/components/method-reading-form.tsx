import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Button, InputAdornment, Stack, TextField, Typography } from '@mui/material';
import { useMemo } from 'react';
import { Controller, useForm, useWatch, type Resolver } from 'react-hook-form';
import { useCreateReading } from '@/features/inspection/api/create-reading';
import { ConductorCaution } from '@/features/inspection/components/conductor-caution';
import { InstrumentPicker } from '@/features/inspection/components/instrument-picker';
import { ReadingPreviewPanel } from '@/features/inspection/components/reading-preview-panel';
import { conductorLabel, isCopperClaim } from '@/features/inspection/lib/labels';
import {
  buildReadingSchema,
  emptyReadingForm,
  readingInputs,
  slotResolutions,
  toReadingRequest,
  type FieldName,
  type ReadingFormValues,
} from '@/features/inspection/lib/reading-form';
import type { MethodDefinition } from '@/features/inspection/lib/reading-methods';
import { previewReading } from '@/features/inspection/lib/reading-preview';
import type { Conductor, Instrument } from '@/features/inspection/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

interface MethodReadingFormProps {
  definition: MethodDefinition;
  sampleId: number;
  conductor: Conductor;
  minAreaRatio: number;
  instruments: readonly Instrument[];
}

export function MethodReadingForm({
  definition,
  sampleId,
  conductor,
  minAreaRatio,
  instruments,
}: MethodReadingFormProps) {
  const create = useCreateReading(sampleId);
  const fieldNames = useMemo(() => definition.fields.map((f) => f.name), [definition]);
  const form = useForm<ReadingFormValues>({
    resolver: zodResolver(buildReadingSchema(definition)) as Resolver<ReadingFormValues>,
    mode: 'onChange',
    defaultValues: emptyReadingForm(definition),
  });
  const watched = useWatch({ control: form.control }) as ReadingFormValues;
  const inputs = readingInputs(definition, { values: watched.values ?? {}, instruments: {} });
  const preview =
    inputs === null
      ? null
      : previewReading({
          definition,
          inputs,
          resolutions: slotResolutions(
            definition,
            { values: {}, instruments: watched.instruments ?? {} },
            instruments,
          ),
          gauge: conductor.gauge,
          claimedMaterial: conductor.claimedMaterial,
          minAreaRatio,
        });
  const { errors, isSubmitting } = form.formState;
  const formErrors = create.isError ? splitServerErrors(create.error, fieldNames).formErrors : [];

  const onSubmit = form.handleSubmit(async (values) => {
    try {
      const reading = await create.mutateAsync(toReadingRequest(definition, values));
      toasts.success(`Recorded: measures as ${reading.measuresAs}.`);
      form.reset(emptyReadingForm(definition));
    } catch (error) {
      const { fieldErrors } = splitServerErrors<FieldName>(error, fieldNames);
      for (const name of fieldNames) {
        const message = fieldErrors[name];
        if (message) form.setError(`values.${name}`, { type: 'server', message });
      }
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label={`${definition.label} reading`}>
      <Stack spacing={2}>
        <Typography variant="body2" color="text.secondary">
          {definition.hint} Enter values as the instrument reads them.
        </Typography>
        {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
        <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
          {definition.fields.map((field) => (
            <TextField
              key={field.name}
              label={field.label}
              inputMode="decimal"
              error={!!errors.values?.[field.name]}
              helperText={errors.values?.[field.name]?.message ?? field.helper}
              slotProps={{
                input: {
                  endAdornment: <InputAdornment position="end">{field.unit}</InputAdornment>,
                },
              }}
              {...form.register(`values.${field.name}`)}
            />
          ))}
        </Stack>
        <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
          {definition.instruments.map((slot) => (
            <Controller
              key={slot.slot}
              control={form.control}
              name={`instruments.${slot.slot}`}
              render={({ field, fieldState }) => (
                <InstrumentPicker
                  slot={slot}
                  instruments={instruments}
                  value={field.value ?? ''}
                  onChange={field.onChange}
                  onBlur={field.onBlur}
                  error={fieldState.error?.message}
                />
              )}
            />
          ))}
        </Stack>
        <ReadingPreviewPanel preview={preview} />
        {preview?.ok && (
          <ConductorCaution
            label={conductorLabel(conductor)}
            undersized={preview.assessment.areaRatio < minAreaRatio}
            notCopper={!isCopperClaim(conductor.claimedMaterial)}
          />
        )}
        <div>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            Record {definition.label.toLowerCase()} reading
          </Button>
        </div>
      </Stack>
    </form>
  );
}
