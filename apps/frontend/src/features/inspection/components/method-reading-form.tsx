import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Checkbox,
  FormControlLabel,
  InputAdornment,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useMemo, useState, type ReactNode } from 'react';
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
  type ReadingRequest,
} from '@/features/inspection/lib/reading-form';
import type { InputField, MethodDefinition } from '@/features/inspection/lib/reading-methods';
import { previewReading } from '@/features/inspection/lib/reading-preview';
import type { Conductor, Instrument, Reading, ReadingMethod } from '@/features/inspection/types';
import { isApiError } from '@/lib/api-client';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

export interface MethodReadingFormProps {
  definition: MethodDefinition;
  sampleId: number;
  conductor: Conductor;
  minAreaRatio: number;
  instruments: readonly Instrument[];
  /** Values and instruments to start from per method (bench mode: what this device used last). */
  initial?: (definition: MethodDefinition) => Partial<ReadingFormValues>;
  /**
   * Records the request another way than posting it to `sampleId` (bench mode creates the
   * sample first and keeps the reading on the device while offline): the stored reading, or
   * null when it was queued.
   */
  record?: (request: ReadingRequest) => Promise<Reading | null>;
  /** After a reading was recorded (or queued), with what the form held. */
  onRecorded?: (reading: Reading | null, values: ReadingFormValues, method: ReadingMethod) => void;
  /** Focus the first empty field on mount (bench mode: the clerk only types). */
  autoFocus?: boolean;
  /** Something shown under a field that can fill it (bench mode: read the balance). */
  fieldAction?: (field: InputField, fill: (text: string) => void) => ReactNode;
}

/** The form's starting values: empty, with what `initial` gives for this method's fields and slots. */
function startingValues(
  definition: MethodDefinition,
  initial?: Partial<ReadingFormValues>,
): ReadingFormValues {
  const empty = emptyReadingForm(definition);
  for (const f of definition.fields) {
    const v = initial?.values?.[f.name];
    if (v) empty.values[f.name] = v;
  }
  for (const s of definition.instruments) {
    const v = initial?.instruments?.[s.slot];
    if (v) empty.instruments[s.slot] = v;
  }
  return empty;
}

export function MethodReadingForm({
  definition,
  sampleId,
  conductor,
  minAreaRatio,
  instruments,
  initial,
  record,
  onRecorded,
  autoFocus,
  fieldAction,
}: MethodReadingFormProps) {
  const create = useCreateReading(sampleId);
  const fieldNames = useMemo(() => definition.fields.map((f) => f.name), [definition]);
  const [startValues] = useState(() => startingValues(definition, initial?.(definition)));
  const firstEmpty = definition.fields.find((f) => !startValues.values[f.name])?.name;
  const form = useForm<ReadingFormValues>({
    resolver: zodResolver(buildReadingSchema(definition)) as Resolver<ReadingFormValues>,
    mode: 'onChange',
    defaultValues: startValues,
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
  const { setValue } = form;
  const fillers = useMemo(
    () =>
      Object.fromEntries(
        definition.fields.map((f) => [
          f.name,
          (text: string) =>
            setValue(`values.${f.name}`, text, { shouldValidate: true, shouldDirty: true }),
        ]),
      ) as Record<FieldName, (text: string) => void>,
    [definition, setValue],
  );
  const [submitError, setSubmitError] = useState<unknown>(null);
  // Resistance: four-wire (Kelvin) unless the clerk says otherwise (REFERENCE §4).
  const [fourWire, setFourWire] = useState(true);
  // A reading the server questioned (a likely typing slip): its messages, until confirmed.
  const [questioned, setQuestioned] = useState<string[] | null>(null);
  const formErrors =
    submitError !== null && questioned === null
      ? splitServerErrors(submitError, fieldNames).formErrors
      : [];

  const submit = async (values: ReadingFormValues, confirmUnusual: boolean) => {
    setSubmitError(null);
    try {
      const request = toReadingRequest(definition, values);
      if (definition.method === 'resistance') request.fourWire = fourWire;
      if (confirmUnusual) request.confirmUnusual = true;
      const reading = record ? await record(request) : await create.mutateAsync(request);
      if (!record && reading) {
        // A green toast never follows a failing reading (issue 13).
        const text = `Recorded: measures as ${reading.measuresAs}, ${reading.verdict}.`;
        if (reading.verdict === 'conforms') toasts.success(text);
        else if (reading.verdict === 'nonconforming') toasts.error(text);
        else toasts.show(text, 'warning');
      }
      setQuestioned(null);
      // The instruments stay chosen for the next reading: the clerk is at the same bench.
      form.reset({ ...emptyReadingForm(definition), instruments: values.instruments });
      onRecorded?.(reading, values, definition.method);
    } catch (error) {
      setSubmitError(error);
      const questions =
        isApiError(error) && error.status === 422
          ? ((error.body as { questions?: { message: string }[] } | null)?.questions ?? [])
          : [];
      if (questions.length) {
        setQuestioned(questions.map((q) => q.message));
        return;
      }
      const { fieldErrors } = splitServerErrors<FieldName>(error, fieldNames);
      for (const name of fieldNames) {
        const message = fieldErrors[name];
        if (message) form.setError(`values.${name}`, { type: 'server', message });
      }
    }
  };
  const onSubmit = form.handleSubmit((values) => submit(values, false));
  const onConfirm = form.handleSubmit((values) => submit(values, true));

  return (
    <form noValidate onSubmit={onSubmit} aria-label={`${definition.label} reading`}>
      <Stack spacing={2}>
        <Typography variant="body2" color="text.secondary">
          {definition.hint} Enter values as the instrument reads them.
        </Typography>
        {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
        {questioned && (
          <Alert
            severity="warning"
            aria-label="Unusual reading"
            action={
              <Button color="inherit" size="small" onClick={() => void onConfirm()}>
                Record it anyway
              </Button>
            }
          >
            Nothing was saved. {questioned.join(' ')} Correct the value, or record it as typed if it
            is right.
          </Alert>
        )}
        <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
          {definition.fields.map((field) => (
            <Stack key={field.name} spacing={0.5} sx={{ flex: 1 }}>
              <TextField
                label={field.label}
                autoFocus={autoFocus && field.name === firstEmpty}
                slotProps={{
                  htmlInput: {
                    inputMode: field.integer ? 'numeric' : 'decimal',
                    enterKeyHint: 'done',
                    autoComplete: 'off',
                  },
                  input: {
                    endAdornment: <InputAdornment position="end">{field.unit}</InputAdornment>,
                  },
                  // A value filled in by the page (the balance) must lift the label too.
                  inputLabel: watched.values?.[field.name] ? { shrink: true } : undefined,
                }}
                error={!!errors.values?.[field.name]}
                helperText={errors.values?.[field.name]?.message ?? field.helper}
                {...form.register(`values.${field.name}`)}
              />
              {fieldAction?.(field, fillers[field.name])}
            </Stack>
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
        {definition.method === 'resistance' && (
          <FormControlLabel
            control={
              <Checkbox checked={fourWire} onChange={(e) => setFourWire(e.target.checked)} />
            }
            label="Four-wire (Kelvin) connection — a two-wire reading is kept but decides nothing"
          />
        )}
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
