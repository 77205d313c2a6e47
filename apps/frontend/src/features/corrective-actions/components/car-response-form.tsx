import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Stack } from '@mui/material';
import { useForm } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { ServerErrorAlert, submitWithServerErrors } from '@/components/form/server-errors';
import {
  responseSchema,
  useUpdateCorrectiveAction,
  type ResponseInput,
} from '@/features/corrective-actions/api/update-corrective-action';
import type { CorrectiveAction } from '@/features/corrective-actions/types';
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

  const onSubmit = submitWithServerErrors(form, FIELDS, async (input) => {
    const saved = await update.mutateAsync({
      id: car.id,
      patch: { ...input, version: car.version, status: 'responded' },
    });
    toasts.success(`The supplier's response to ${saved.number} is recorded.`);
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Supplier response">
      <Stack spacing={2}>
        <ServerErrorAlert error={update.error} fields={FIELDS} />
        {FIELDS.map((f) => (
          <FormTextField
            key={f}
            control={form.control}
            name={f}
            label={LABELS[f].label}
            required
            multiline
            minRows={2}
            helperText={LABELS[f].hint}
          />
        ))}
        <div>
          <Button type="submit" variant="contained" loading={form.formState.isSubmitting}>
            Record the response
          </Button>
        </div>
      </Stack>
    </form>
  );
}
