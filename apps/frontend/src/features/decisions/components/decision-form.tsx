import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  FormControl,
  FormControlLabel,
  FormHelperText,
  FormLabel,
  Radio,
  RadioGroup,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { Controller, useForm } from 'react-hook-form';
import { SafetyCaution } from '@/components/safety-caution';
import {
  decisionInputOf,
  decisionSchema,
  type DecisionFormValues,
  type DecisionInput,
} from '@/features/decisions/api/create-decision';
import { MIN_REASON_LENGTH, reasonRequirement } from '@/features/decisions/lib/reason-rule';
import {
  outcomeLabels,
  type DecisionOutcome,
  type Recommendation,
} from '@/features/decisions/types';
import { splitServerErrors } from '@/lib/server-field-errors';

/** The server's field names and the form's (a concession's terms are nested there). */
const SERVER_FIELDS = {
  outcome: 'outcome',
  reason: 'reason',
  'concession.scope': 'scope',
  'concession.quantity': 'quantity',
  'concession.expiresOn': 'expiresOn',
  concession: 'scope',
} as const;
const FIELDS = Object.keys(SERVER_FIELDS) as (keyof typeof SERVER_FIELDS)[];
const OUTCOMES = Object.keys(outcomeLabels) as DecisionOutcome[];

interface DecisionFormProps {
  recommendation: Recommendation;
  /** The lot's quantity and unit: a concession covers at most the lot. */
  lotQuantity: number;
  unit: string;
  submitLabel: string;
  /** Sends the decision; rejects with the server's error. */
  onDecide: (input: DecisionInput) => Promise<unknown>;
  formErrors: string[];
}

export function DecisionForm({
  recommendation,
  lotQuantity,
  unit,
  submitLabel,
  onDecide,
  formErrors,
}: DecisionFormProps) {
  const form = useForm({
    resolver: zodResolver(decisionSchema(recommendation, lotQuantity)),
    mode: 'onChange',
    defaultValues: {
      outcome: recommendation === 'incomplete' ? '' : recommendation,
      reason: '',
      scope: '',
      quantity: String(lotQuantity),
      expiresOn: '',
    } as {
      outcome: DecisionOutcome | '';
      reason: string;
      scope: string;
      quantity: string;
      expiresOn: string;
    },
  });
  const { errors, isSubmitting } = form.formState;
  const outcome = form.watch('outcome');
  const reason = form.watch('reason');
  const requirement = outcome ? reasonRequirement(outcome, recommendation) : null;
  const length = reason.trim().length;
  const concession = outcome === 'accept_on_concession';

  const onSubmit = form.handleSubmit(async (values: DecisionFormValues) => {
    try {
      await onDecide(decisionInputOf(values));
      form.reset({ ...values, reason: '' });
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const field of FIELDS) {
        const message = fieldErrors[field];
        if (message) form.setError(SERVER_FIELDS[field], { type: 'server', message });
      }
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Decision">
      <Stack spacing={2}>
        {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
        <Controller
          control={form.control}
          name="outcome"
          render={({ field }) => (
            <FormControl error={!!errors.outcome}>
              <FormLabel id="decision-outcome">Outcome</FormLabel>
              <RadioGroup
                aria-labelledby="decision-outcome"
                {...field}
                onChange={(event) => {
                  field.onChange(event);
                  if (form.getValues('reason')) void form.trigger('reason');
                }}
              >
                {OUTCOMES.map((o) => (
                  <FormControlLabel
                    key={o}
                    value={o}
                    control={<Radio />}
                    label={
                      o === recommendation ? `${outcomeLabels[o]} (recommended)` : outcomeLabels[o]
                    }
                  />
                ))}
              </RadioGroup>
              {errors.outcome && <FormHelperText>{errors.outcome.message}</FormHelperText>}
            </FormControl>
          )}
        />
        {concession && (
          <Stack spacing={2} role="group" aria-label="Concession terms">
            <SafetyCaution />
            <Typography variant="body2">
              A concession releases this lot for a stated use only. Give its terms; they print on
              the lot's tag.
              {recommendation === 'reject' &&
                " Against a reject recommendation, a second QA lead or an admin approves it before the lot is released (the product's policy, on unless a QA lead turned it off)."}
            </Typography>
            <TextField
              label="May be used for"
              multiline
              minRows={2}
              required
              error={!!errors.scope}
              helperText={
                errors.scope?.message ??
                'e.g. "ground runs of 1 m or less; not for power or fused runs"'
              }
              {...form.register('scope')}
            />
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
              <TextField
                label={`Quantity (${unit})`}
                type="number"
                required
                slotProps={{ htmlInput: { min: 0, step: 'any' } }}
                error={!!errors.quantity}
                helperText={errors.quantity?.message ?? `Of the lot's ${lotQuantity} ${unit}`}
                {...form.register('quantity')}
              />
              <TextField
                label="Holds until"
                type="date"
                required
                slotProps={{ inputLabel: { shrink: true } }}
                error={!!errors.expiresOn}
                helperText={errors.expiresOn?.message ?? 'The last day it may be used'}
                {...form.register('expiresOn')}
              />
            </Stack>
          </Stack>
        )}
        <TextField
          label={requirement ? 'Reason (required)' : 'Reason (optional)'}
          multiline
          minRows={3}
          required={!!requirement}
          error={!!errors.reason}
          helperText={
            errors.reason?.message ??
            (requirement
              ? `${requirement}: ${length} / ${MIN_REASON_LENGTH} characters at least.`
              : `${length} characters. Optional when you follow the recommendation.`)
          }
          {...form.register('reason')}
        />
        <div>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            {concession && recommendation === 'reject' ? 'Ask for the concession' : submitLabel}
          </Button>
        </div>
      </Stack>
    </form>
  );
}
