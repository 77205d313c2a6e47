import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  TextField,
} from '@mui/material';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import {
  instrumentSchema,
  toInstrumentBody,
  useCreateInstrument,
  type InstrumentInput,
} from '@/features/instruments/api/create-instrument';
import { instrumentPatch, useUpdateInstrument } from '@/features/instruments/api/update-instrument';
import {
  INSTRUMENT_KINDS,
  UNITS_BY_KIND,
  kindLabels,
  unitLabels,
  type Instrument,
} from '@/features/instruments/types';
import { StaleEditAlert, staleCurrent } from '@/components/stale-edit-alert';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = [
  'kind',
  'name',
  'serial',
  'resolution',
  'resolutionUnit',
  'accuracyPercentOfReading',
  'accuracyAbsolute',
  'calibrationUncertainty',
  'calibratedOn',
  'calibrationDueOn',
] as const;
const EMPTY: InstrumentInput = {
  kind: 'balance',
  name: '',
  serial: '',
  resolution: '',
  resolutionUnit: 'g',
  accuracyPercentOfReading: '',
  accuracyAbsolute: '',
  calibrationUncertainty: '',
  calibratedOn: '',
  calibrationDueOn: '',
};
const toInput = (i: Instrument): InstrumentInput => ({
  kind: i.kind,
  name: i.name,
  serial: i.serial,
  resolution: String(i.resolution),
  resolutionUnit: i.resolutionUnit,
  accuracyPercentOfReading: i.accuracyPercentOfReading?.toString() ?? '',
  accuracyAbsolute: i.accuracyAbsolute?.toString() ?? '',
  calibrationUncertainty: i.calibrationUncertainty?.toString() ?? '',
  calibratedOn: i.calibratedOn,
  calibrationDueOn: i.calibrationDueOn,
});

export function InstrumentDialog(props: { instrument: Instrument | null; onClose: () => void }) {
  const { instrument, onClose } = props;
  const create = useCreateInstrument();
  const update = useUpdateInstrument();
  const mutation = instrument ? update : create;
  const form = useForm<InstrumentInput>({
    resolver: zodResolver(instrumentSchema),
    mode: 'onChange',
    defaultValues: instrument ? toInput(instrument) : EMPTY,
  });
  const { errors, isSubmitting } = form.formState;
  const kind = useWatch({ control: form.control, name: 'kind' });
  // The copy the edit is made on: its fields tell what the user changed, its version goes along.
  const [loaded, setLoaded] = useState(instrument);
  // The instrument as someone else saved it after this form was opened (a 409), until resolved.
  const [theirs, setTheirs] = useState<Instrument | null>(null);
  const formErrors =
    mutation.isError && !theirs ? splitServerErrors(mutation.error, FIELDS).formErrors : [];

  const save = async (input: InstrumentInput, version: number | undefined) => {
    const body = toInstrumentBody(input);
    try {
      const saved = loaded
        ? await update.mutateAsync({
            id: loaded.id,
            version: version ?? loaded.version,
            patch: instrumentPatch(loaded, body),
          })
        : await create.mutateAsync(body);
      toasts.success(`${saved.name} saved.`);
      onClose();
    } catch (error) {
      const current = staleCurrent<Instrument>(error);
      if (current) {
        setTheirs(current);
        return;
      }
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const field of FIELDS) {
        const message = fieldErrors[field];
        if (message) form.setError(field, { type: 'server', message });
      }
    }
  };
  const onSubmit = form.handleSubmit((input) => save(input, undefined));
  const onSaveMine = form.handleSubmit((input) => {
    const version = theirs?.version;
    setTheirs(null);
    return save(input, version);
  });
  const onLoadTheirs = () => {
    if (!theirs) return;
    form.reset(toInput(theirs));
    setLoaded(theirs);
    setTheirs(null);
    update.reset();
  };

  const title = instrument ? `Edit ${instrument.name}` : 'New instrument';
  const select = (name: 'kind' | 'resolutionUnit', label: string, options: readonly string[]) => (
    <Controller
      control={form.control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField
          select
          label={label}
          {...field}
          onChange={(event) => {
            field.onChange(event);
            if (name === 'kind') {
              const units = UNITS_BY_KIND[event.target.value as Instrument['kind']];
              form.setValue('resolutionUnit', units[0], { shouldValidate: true });
            }
          }}
          error={!!fieldState.error}
          helperText={fieldState.error?.message}
        >
          {options.map((o) => (
            <MenuItem key={o} value={o}>
              {name === 'kind'
                ? kindLabels[o as Instrument['kind']]
                : unitLabels[o as Instrument['resolutionUnit']]}
            </MenuItem>
          ))}
        </TextField>
      )}
    />
  );
  const text = (
    name: (typeof FIELDS)[number],
    label: string,
    { helper, ...extra }: { helper?: string } & Record<string, unknown> = {},
  ) => (
    <TextField
      label={label}
      error={!!errors[name]}
      helperText={errors[name]?.message ?? helper}
      {...extra}
      {...form.register(name)}
    />
  );

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label={title}>
        <DialogTitle>{title}</DialogTitle>
        <DialogContent>
          {theirs && (
            <StaleEditAlert
              what="this instrument"
              onLoadTheirs={onLoadTheirs}
              onSaveMine={() => void onSaveMine()}
              saving={isSubmitting}
            />
          )}
          {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
          {select('kind', 'Kind', INSTRUMENT_KINDS)}
          {text('name', 'Name')}
          {text('serial', 'Serial number')}
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', columnGap: 1.5 }}>
            {text('resolution', 'Resolution', { inputMode: 'decimal' })}
            {select('resolutionUnit', 'Unit', UNITS_BY_KIND[kind])}
          </Box>
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr 1fr', columnGap: 1.5 }}>
            {text('accuracyPercentOfReading', 'Accuracy ± % of reading', {
              inputMode: 'decimal',
              helper: 'From the maker’s specification; optional.',
            })}
            {text('accuracyAbsolute', 'Accuracy ± amount', {
              inputMode: 'decimal',
              helper: 'In the unit above; optional.',
            })}
            {text('calibrationUncertainty', 'Certificate U (k = 2)', {
              inputMode: 'decimal',
              helper: 'In the unit above; optional.',
            })}
          </Box>
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', columnGap: 1.5 }}>
            {text('calibratedOn', 'Calibrated on', {
              type: 'date',
              slotProps: { inputLabel: { shrink: true } },
            })}
            {text('calibrationDueOn', 'Calibration due', {
              type: 'date',
              slotProps: { inputLabel: { shrink: true } },
            })}
          </Box>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            {instrument ? 'Save' : 'Add instrument'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
