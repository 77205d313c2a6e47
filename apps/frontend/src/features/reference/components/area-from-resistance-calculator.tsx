import { useState } from 'react';
import { calcAreaFromResistance } from '@/features/reference/calculations';
import { useAreaCommonInputs } from '@/features/reference/components/area-common-inputs';
import { AreaOutcomeView } from '@/features/reference/components/area-outcome-view';
import { CalculatorFrame } from '@/features/reference/components/calculator-frame';
import { useUnitText } from '@/features/reference/use-unit-text';
import { inputUnits, useUnits } from '@/lib/units';

/** Four-wire resistance over a length, corrected to 20 °C: the copper-equivalent area. */
export function AreaFromResistanceCalculator() {
  const { system } = useUnits();
  const [resistance, setResistance] = useState('');
  const [length, setLength] = useUnitText('shortLength');
  const [temperature, setTemperature] = useState('20');
  const common = useAreaCommonInputs({ materialLabel: 'Material', compareExample: '25 mm²' });
  const calc = calcAreaFromResistance({
    system,
    resistanceMilliOhm: resistance,
    length,
    temperatureC: temperature,
    ...common.values,
  });
  return (
    <CalculatorFrame
      calc={calc}
      rows={[
        [
          {
            label: 'Resistance',
            unit: 'mΩ',
            value: resistance,
            onChange: setResistance,
            errorFor: 'resistanceOhm',
            helperText: 'Four-wire (Kelvin) reading',
          },
          {
            label: 'Length between contacts',
            unit: inputUnits[system].shortLength,
            value: length,
            onChange: setLength,
            errorFor: 'lengthMm',
          },
          {
            label: 'Conductor temperature',
            unit: '°C',
            value: temperature,
            onChange: setTemperature,
            errorFor: 'temperatureC',
            helperText: 'Corrected to 20 °C with α₂₀',
          },
        ],
        [common.material, common.stranding, common.compare],
      ]}
    >
      {(outcome) => <AreaOutcomeView outcome={outcome} />}
    </CalculatorFrame>
  );
}
