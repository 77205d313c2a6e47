import { type MaterialId } from '@gaugeproof/standards';
import { Alert, Stack } from '@mui/material';
import { useState } from 'react';
import { calcVoltageDrop } from '@/features/reference/calculations';
import { CalcField, MaterialField } from '@/features/reference/components/calc-field';
import { DropResults } from '@/features/reference/components/drop-results';
import { useUnitText } from '@/features/reference/use-unit-text';
import { inputUnits, useUnits } from '@/lib/units';

/** V = I · R over the whole circuit, labelled size against measured (REFERENCE §7). */
export function VoltageDropCalculator() {
  const { system } = useUnits();
  const units = inputUnits[system];
  const [label, setLabel] = useState('4 AWG');
  const [measuredArea, setMeasuredArea] = useUnitText('area');
  const [material, setMaterial] = useState<MaterialId>('copper');
  const [powerLength, setPowerLength] = useUnitText('runLength');
  const [groundLength, setGroundLength] = useUnitText('runLength');
  const [current, setCurrent] = useState('');
  const [temperature, setTemperature] = useState('20');
  const calc = calcVoltageDrop({
    system,
    label,
    measuredArea,
    measuredMaterial: material,
    powerLength,
    groundLength,
    currentA: current,
    temperatureC: temperature,
  });
  const errorOf = (...fields: string[]) =>
    !calc.ok && fields.includes(calc.field) && calc.message !== 'Enter a value.'
      ? calc.message
      : undefined;

  return (
    <Stack spacing={2}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <CalcField
          label="Label gauge"
          inputMode="text"
          value={label}
          onChange={setLabel}
          error={errorOf('label')}
        />
        <CalcField
          label="Measured area"
          unit={system === 'imperial' ? 'cmil' : 'mm²'}
          value={measuredArea}
          onChange={setMeasuredArea}
          error={errorOf('measuredArea', 'areaMm2')}
          helperText="Optional: from a reading"
        />
        <MaterialField label="Measured material" value={material} onChange={setMaterial} />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <CalcField
          label="Power run"
          unit={units.runLength}
          value={powerLength}
          onChange={setPowerLength}
          error={errorOf('powerLength')}
          helperText="Battery to equipment"
        />
        <CalcField
          label="Ground run"
          unit={units.runLength}
          value={groundLength}
          onChange={setGroundLength}
          error={errorOf('groundLength', 'circuitLengthM')}
          helperText="Equipment to ground point"
        />
        <CalcField
          label="Current"
          unit="A"
          value={current}
          onChange={setCurrent}
          error={errorOf('currentA')}
        />
        <CalcField
          label="Conductor temperature"
          unit="°C"
          value={temperature}
          onChange={setTemperature}
          error={errorOf('temperatureC')}
        />
      </Stack>
      {calc.ok ? (
        <DropResults outcome={calc.value} />
      ) : (
        <Alert severity="info" variant="outlined">
          {calc.message === 'Enter a value.'
            ? 'Fill in the fields; the result appears as you type.'
            : calc.message}
        </Alert>
      )}
    </Stack>
  );
}
