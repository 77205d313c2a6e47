import type { MaterialId } from '@gaugeproof/standards';
import { Alert, Stack } from '@mui/material';
import type { ReactNode } from 'react';
import type { Calc } from '@/features/reference/calculations';
import { CalcField, MaterialField } from '@/features/reference/components/calc-field';

/** A number (or text) input of a calculator. */
interface NumberInput {
  label: string;
  value: string;
  onChange: (value: string) => void;
  unit?: string;
  helperText?: string;
  inputMode?: 'decimal' | 'numeric' | 'text';
  /** The calculation's field name(s) whose problem this input shows. */
  errorFor: string | readonly string[];
}

/** The choice of a conductor material. */
interface MaterialInput {
  label: string;
  material: MaterialId;
  onChange: (value: MaterialId) => void;
}

export type CalculatorInput = NumberInput | MaterialInput;

/** "Enter a value.": a field still empty, which is no error yet. */
const stillEmpty = (message: string) => message === 'Enter a value.';

/**
 * A reference calculator: its inputs in rows (side by side from `sm` up), a problem shown on
 * the input it is about once something is typed, and below them the live result or, until
 * there is one, what is missing.
 */
export function CalculatorFrame<T>({
  calc,
  rows,
  isQuiet = stillEmpty,
  children,
}: {
  calc: Calc<T>;
  rows: readonly (readonly CalculatorInput[])[];
  /** A problem the inputs do not show (the waiting note still does). */
  isQuiet?: (message: string) => boolean;
  /** The result, once every input reads. */
  children: (value: T) => ReactNode;
}) {
  const errorOf = (fields: string | readonly string[]) =>
    !calc.ok && [fields].flat().includes(calc.field) && !isQuiet(calc.message)
      ? calc.message
      : undefined;
  return (
    <Stack spacing={2}>
      {rows.map((row, index) => (
        <Stack key={index} direction={{ xs: 'column', sm: 'row' }} spacing={2}>
          {row.map((input) =>
            'material' in input ? (
              <MaterialField
                key={input.label}
                label={input.label}
                value={input.material}
                onChange={input.onChange}
              />
            ) : (
              <CalcField
                key={input.label}
                label={input.label}
                unit={input.unit}
                inputMode={input.inputMode}
                value={input.value}
                onChange={input.onChange}
                error={errorOf(input.errorFor)}
                helperText={input.helperText}
              />
            ),
          )}
        </Stack>
      ))}
      {calc.ok ? (
        children(calc.value)
      ) : (
        <Alert severity="info" variant="outlined">
          {stillEmpty(calc.message)
            ? 'Fill in the fields; the result appears as you type.'
            : calc.message}
        </Alert>
      )}
    </Stack>
  );
}
