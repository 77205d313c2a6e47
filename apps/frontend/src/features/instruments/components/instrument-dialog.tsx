import { zodResolver } from '@hookform/resolvers/zod';
import {
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
} from '@mui/material';
import { useForm, useWatch } from 'react-hook-form';
import { FormTextField, type FormTextFieldProps } from '@/components/form/form-text-field';
import { createOrUpdate, useVersionedEdit } from '@/components/form/use-versioned-edit';
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

type FieldProps = Omit<FormTextFieldProps<InstrumentInput, InstrumentInput>, 'control' | 'name'>;

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
  const { isSubmitting } = form.formState;
  const kind = useWatch({ control: form.control, name: 'kind' });
  const edit = useVersionedEdit({
    form,
    fields: FIELDS,
    record: instrument,
    toInput,
    mutation,
    what: 'this instrument',
    save: async (input, base, version) => {
      const saved = await createOrUpdate(base, version, toInstrumentBody(input), {
        create: create.mutateAsync,
        update: update.mutateAsync,
        patch: (body, from) => instrumentPatch(from, body),
      });
      toasts.success(`${saved.name} saved.`);
      onClose();
    },
  });

  const title = instrument ? `Edit ${instrument.name}` : 'New instrument';
  const field = (name: (typeof FIELDS)[number], label: string, props: FieldProps = {}) => (
    <FormTextField control={form.control} name={name} label={label} {...props} />
  );
  const decimal = (name: (typeof FIELDS)[number], label: string, helperText?: string) =>
    field(name, label, { helperText, slotProps: { htmlInput: { inputMode: 'decimal' } } });
  const date = (name: (typeof FIELDS)[number], label: string) =>
    field(name, label, { type: 'date', slotProps: { inputLabel: { shrink: true } } });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={edit.onSubmit} aria-label={title}>
        <DialogTitle>{title}</DialogTitle>
        <DialogContent>
          {edit.alerts}
          {field('kind', 'Kind', {
            select: true,
            // Each kind reads in its own units: the unit follows the kind.
            onValueChange: (value) =>
              form.setValue('resolutionUnit', UNITS_BY_KIND[value as Instrument['kind']][0], {
                shouldValidate: true,
              }),
            children: INSTRUMENT_KINDS.map((k) => (
              <MenuItem key={k} value={k}>
                {kindLabels[k]}
              </MenuItem>
            )),
          })}
          {field('name', 'Name')}
          {field('serial', 'Serial number')}
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', columnGap: 1.5 }}>
            {decimal('resolution', 'Resolution')}
            {field('resolutionUnit', 'Unit', {
              select: true,
              children: UNITS_BY_KIND[kind].map((u) => (
                <MenuItem key={u} value={u}>
                  {unitLabels[u]}
                </MenuItem>
              )),
            })}
          </Box>
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr 1fr', columnGap: 1.5 }}>
            {decimal(
              'accuracyPercentOfReading',
              'Accuracy ± % of reading',
              'From the maker’s specification; optional.',
            )}
            {decimal('accuracyAbsolute', 'Accuracy ± amount', 'In the unit above; optional.')}
            {decimal(
              'calibrationUncertainty',
              'Certificate U (k = 2)',
              'In the unit above; optional.',
            )}
          </Box>
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', columnGap: 1.5 }}>
            {date('calibratedOn', 'Calibrated on')}
            {date('calibrationDueOn', 'Calibration due')}
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
