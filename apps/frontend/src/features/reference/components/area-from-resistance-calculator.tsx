import { STANDARD_STRANDING_INCREMENT, type MaterialId } from '@gaugeproof/standards';
import { Stack } from '@mui/material';
import { useState } from 'react';
import { calcAreaFromResistance } from '@/features/reference/calculations';
import { AreaOutcomeView } from '@/features/reference/components/area-outcome-view';
import { CalcField, MaterialField } from '@/features/reference/components/calc-field';
import { useUnitText } from '@/features/reference/use-unit-text';
import { inputUnits, useUnits } from '@/lib/units';

/** Four-wire resistance over a length, corrected to 20 °C: the copper-equivalent area. */
export function AreaFromResistanceCalculator() {
  const { system } = useUnits();
  const [resistance, setResistance] = useState('');
  const [length, setLength] = useUnitText('shortLength');
  const [temperature, setTemperature] = useState('20');
  const [material, setMaterial] = useState<MaterialId>('copper');
  const [k, setK] = useState(String(STANDARD_STRANDING_INCREMENT * 100));
  const [label, setLabel] = useState('');
  const calc = calcAreaFromResistance({
    system,
    resistanceMilliOhm: resistance,
    length,
    temperatureC: temperature,
    material,
    strandingIncrementPercent: k,
    compareLabel: label,
  });
  const errorOf = (field: string) =>
    !calc.ok && calc.field === field && calc.message !== 'Enter a value.'
      ? calc.message
      : undefined;

  return (
    <Stack spacing={2}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <CalcField
          label="Resistance"
          unit="mΩ"
          value={resistance}
          onChange={setResistance}
          error={errorOf('resistanceOhm')}
          helperText="Four-wire (Kelvin) reading"
        />
        <CalcField
          label="Length between contacts"
          unit={inputUnits[system].shortLength}
          value={length}
          onChange={setLength}
          error={errorOf('lengthMm')}
        />
        <CalcField
          label="Conductor temperature"
          unit="°C"
          value={temperature}
          onChange={setTemperature}
          error={errorOf('temperatureC')}
          helperText="Corrected to 20 °C with α₂₀"
        />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <MaterialField label="Material" value={material} onChange={setMaterial} />
        <CalcField
          label="Stranding increment"
          unit="%"
          value={k}
          onChange={setK}
          error={errorOf('strandingIncrement')}
        />
        <CalcField
          label="Compare with label"
          inputMode="text"
          value={label}
          onChange={setLabel}
          error={errorOf('label')}
          helperText="Optional, e.g. 25 mm²"
        />
      </Stack>
      <AreaOutcomeView calc={calc} />
    </Stack>
  );
}
