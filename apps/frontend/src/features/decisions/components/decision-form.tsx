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
} from '@mui/material';
import { Controller, useForm } from 'react-hook-form';
import { decisionSchema, type DecisionInput } from '@/features/decisions/api/create-decision';
import { MIN_REASON_LENGTH, reasonRequirement } from '@/features/decisions/lib/reason-rule';
import {
  outcomeLabels,
  type DecisionOutcome,
  type Recommendation,
} from '@/features/decisions/types';
import { splitServerErrors } from '@/lib/server-field-errors';

const FIELDS = ['outcome', 'reason'] as const;
const OUTCOMES = Object.keys(outcomeLabels) as DecisionOutcome[];

interface DecisionFormProps {
  recommendation: Recommendation;
  submitLabel: string;
  /** Sends the decision; rejects with the server's error. */
  onDecide: (input: DecisionInput) => Promise<unknown>;
  formErrors: string[];
}

export function DecisionForm({
  recommendation,
  submitLabel,
  onDecide,
  formErrors,
}: DecisionFormProps) {
  const form = useForm({
    resolver: zodResolver(decisionSchema(recommendation)),
    mode: 'onChange',
    defaultValues: {
      outcome: recommendation === 'incomplete' ? '' : recommendation,
      reason: '',
    } as { outcome: DecisionOutcome | ''; reason: string },
  });
  const { errors, isSubmitting } = form.formState;
  const outcome = form.watch('outcome');
  const reason = form.watch('reason');
  const requirement = outcome ? reasonRequirement(outcome, recommendation) : null;
  const length = reason.trim().length;

  const onSubmit = form.handleSubmit(async (input) => {
    try {
      await onDecide(input);
      form.reset({ outcome: input.outcome, reason: '' });
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const field of FIELDS) {
        const message = fieldErrors[field];
        if (message) form.setError(field, { type: 'server', message });
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
            {submitLabel}
          </Button>
        </div>
      </Stack>
    </form>
  );
}
