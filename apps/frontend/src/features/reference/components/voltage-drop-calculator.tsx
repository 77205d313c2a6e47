import { type MaterialId } from '@gaugeproof/standards';
import { useState } from 'react';
import { calcVoltageDrop } from '@/features/reference/calculations';
import { CalculatorFrame } from '@/features/reference/components/calculator-frame';
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
  return (
    <CalculatorFrame
      calc={calc}
      rows={[
        [
          {
            label: 'Label gauge',
            inputMode: 'text',
            value: label,
            onChange: setLabel,
            errorFor: 'label',
          },
          {
            label: 'Measured area',
            unit: system === 'imperial' ? 'cmil' : 'mm²',
            value: measuredArea,
            onChange: setMeasuredArea,
            errorFor: ['measuredArea', 'areaMm2'],
            helperText: 'Optional: from a reading',
          },
          { label: 'Measured material', material, onChange: setMaterial },
        ],
        [
          {
            label: 'Power run',
            unit: units.runLength,
            value: powerLength,
            onChange: setPowerLength,
            errorFor: 'powerLength',
            helperText: 'Battery to equipment',
          },
          {
            label: 'Ground run',
            unit: units.runLength,
            value: groundLength,
            onChange: setGroundLength,
            errorFor: ['groundLength', 'circuitLengthM'],
            helperText: 'Equipment to ground point',
          },
          {
            label: 'Current',
            unit: 'A',
            value: current,
            onChange: setCurrent,
            errorFor: 'currentA',
          },
          {
            label: 'Conductor temperature',
            unit: '°C',
            value: temperature,
            onChange: setTemperature,
            errorFor: 'temperatureC',
          },
        ],
      ]}
    >
      {(outcome) => <DropResults outcome={outcome} />}
    </CalculatorFrame>
  );
}
