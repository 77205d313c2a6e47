import { zodResolver } from '@hookform/resolvers/zod';
import { Button, ButtonGroup, Stack } from '@mui/material';
import { useForm } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import {
  dateRangeSchema,
  presetOf,
  presetRange,
  RANGE_PRESETS,
} from '@/features/scorecards/lib/date-range';
import type { DateRange } from '@/features/scorecards/types';

const DATE_INPUTS = [
  { name: 'from', label: 'Received from', helperText: ' ' },
  { name: 'to', label: 'Received to', helperText: 'Both days included' },
] as const;

interface DateRangePickerProps {
  value: DateRange;
  onChange: (range: DateRange) => void;
}

/**
 * Received-date range: two date inputs checked as they are typed (the server's own
 * rules), applied as soon as both make a valid range; presets for the last 3, 6, 12 months.
 */
export function DateRangePicker({ value, onChange }: DateRangePickerProps) {
  const form = useForm<DateRange>({
    resolver: zodResolver(dateRangeSchema),
    mode: 'onChange',
    values: value,
  });

  // Applied from the inputs' own change events, not an effect, so a preset chosen
  // meanwhile is never overwritten by the form's previous values.
  const apply = () => {
    const parsed = dateRangeSchema.safeParse(form.getValues());
    if (parsed.success && (parsed.data.from !== value.from || parsed.data.to !== value.to)) {
      onChange(parsed.data);
    }
  };

  const active = presetOf(value);
  return (
    <Stack direction={{ xs: 'column', md: 'row' }} spacing={2} sx={{ alignItems: 'flex-start' }}>
      {DATE_INPUTS.map((input) => (
        <FormTextField
          key={input.name}
          control={form.control}
          name={input.name}
          onValueChange={apply}
          label={input.label}
          type="date"
          size="small"
          helperText={input.helperText}
          slotProps={{ inputLabel: { shrink: true } }}
        />
      ))}
      <ButtonGroup size="small" aria-label="Range presets" sx={{ mt: { md: 0.5 } }}>
        {RANGE_PRESETS.map((months) => (
          <Button
            key={months}
            variant={active === months ? 'contained' : 'outlined'}
            sx={{ whiteSpace: 'nowrap' }}
            aria-pressed={active === months}
            onClick={() => onChange(presetRange(months))}
          >
            Last {months} months
          </Button>
        ))}
      </ButtonGroup>
    </Stack>
  );
}
