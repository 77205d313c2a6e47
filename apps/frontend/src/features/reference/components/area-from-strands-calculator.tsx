import { useState } from 'react';
import { calcAreaFromStrands } from '@/features/reference/calculations';
import { AreaOutcomeView } from '@/features/reference/components/area-outcome-view';
import { CalculatorFrame } from '@/features/reference/components/calculator-frame';
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
  return (
    <CalculatorFrame
      calc={calc}
      // Any "Enter …" (a value, a number, at least one value) waits below, not on a field.
      isQuiet={(message) => message.startsWith('Enter')}
      rows={[
        [
          {
            label: 'Strand count',
            inputMode: 'numeric',
            value: count,
            onChange: setCount,
            errorFor: 'count',
          },
          {
            label: 'Strand diameters',
            unit: inputUnits[system].shortLength,
            inputMode: 'text',
            value: diameters,
            onChange: setDiameters,
            errorFor: 'strandDiameterMm',
            helperText: 'Measure at least three strands; separate with spaces.',
          },
          {
            label: 'Compare with label',
            inputMode: 'text',
            value: label,
            onChange: setLabel,
            errorFor: 'label',
            helperText: 'Optional, e.g. 8 AWG',
          },
        ],
      ]}
    >
      {(outcome) => <AreaOutcomeView outcome={outcome} />}
    </CalculatorFrame>
  );
}
