import { Stack } from '@mui/material';
import { useState } from 'react';
import { calcAreaFromStrands } from '@/features/reference/calculations';
import { AreaOutcomeView } from '@/features/reference/components/area-outcome-view';
import { CalcField } from '@/features/reference/components/calc-field';
import { useUnitText } from '@/features/reference/use-unit-text';
import { inputUnits, useUnits } from '@/lib/units';

/** A = n · π d² / 4, d the mean of several strands measured with a micrometer. */
export function AreaFromStrandsCalculator() {
  const { system } = useUnits();
  const [count, setCount] = useState('');
  const [diameters, setDiameters] = useUnitText('shortLength');
  const [label, setLabel] = useState('');
  const calc = calcAreaFromStrands({
    system,
    count,
    strandDiameters: diameters,
    compareLabel: label,
  });
  const errorOf = (field: string) =>
    !calc.ok && calc.field === field && !calc.message.startsWith('Enter')
      ? calc.message
      : undefined;

  return (
    <Stack spacing={2}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <CalcField
          label="Strand count"
          inputMode="numeric"
          value={count}
          onChange={setCount}
          error={errorOf('count')}
        />
        <CalcField
          label="Strand diameters"
          unit={inputUnits[system].shortLength}
          inputMode="text"
          value={diameters}
          onChange={setDiameters}
          error={errorOf('strandDiameterMm')}
          helperText="Measure at least three strands; separate with spaces."
        />
        <CalcField
          label="Compare with label"
          inputMode="text"
          value={label}
          onChange={setLabel}
          error={errorOf('label')}
          helperText="Optional, e.g. 8 AWG"
        />
      </Stack>
      <AreaOutcomeView calc={calc} />
    </Stack>
  );
}
