import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Button, Stack, TextField } from '@mui/material';
import { useForm } from 'react-hook-form';
import {
  responseSchema,
  useUpdateCorrectiveAction,
  type ResponseInput,
} from '@/features/corrective-actions/api/update-corrective-action';
import type { CorrectiveAction } from '@/features/corrective-actions/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['containment', 'rootCause', 'correctiveAction'] as const;
const LABELS: Record<(typeof FIELDS)[number], { label: string; hint: string }> = {
  containment: {
    label: 'Containment',
    hint: 'What the supplier did at once: stock quarantined, sorted, replaced.',
  },
  rootCause: {
    label: 'Root cause',
    hint: 'Why the cable came out undersized or of the wrong material.',
  },
  correctiveAction: {
    label: 'Corrective action',
    hint: 'What changes so that it does not happen again.',
  },
};

/** Purchasing records the supplier's answer; the request moves to responded. */
export function CarResponseForm({ car }: { car: CorrectiveAction }) {
  const update = useUpdateCorrectiveAction({ inlineErrors: true });
  const form = useForm<ResponseInput>({
    resolver: zodResolver(responseSchema),
    mode: 'onChange',
    defaultValues: {
      containment: car.containment ?? '',
      rootCause: car.rootCause ?? '',
      correctiveAction: car.correctiveAction ?? '',
    },
  });
  const { errors, isSubmitting } = form.formState;
  const formErrors = update.isError ? splitServerErrors(update.error, FIELDS).formErrors : [];

  const onSubmit = form.handleSubmit(async (input) => {
    try {
      const saved = await update.mutateAsync({
        id: car.id,
        patch: { ...input, version: car.version, status: 'responded' },
      });
      toasts.success(`The supplier's response to ${saved.number} is recorded.`);
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const f of FIELDS) {
        const message = fieldErrors[f];
        if (message) form.setError(f, { type: 'server', message });
      }
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Supplier response">
      <Stack spacing={2}>
        {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
        {FIELDS.map((f) => (
          <TextField
            key={f}
            label={LABELS[f].label}
            required
            multiline
            minRows={2}
            error={!!errors[f]}
            helperText={errors[f]?.message ?? LABELS[f].hint}
            {...form.register(f)}
          />
        ))}
        <div>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            Record the response
          </Button>
        </div>
      </Stack>
    </form>
  );
}
