import { STANDARD_STRANDING_INCREMENT, type MaterialId } from '@gaugeproof/standards';
import { Stack } from '@mui/material';
import { useState } from 'react';
import { calcAreaFromMass } from '@/features/reference/calculations';
import { AreaOutcomeView } from '@/features/reference/components/area-outcome-view';
import { CalcField, MaterialField } from '@/features/reference/components/calc-field';
import { useUnitText } from '@/features/reference/use-unit-text';
import { inputUnits, useUnits } from '@/lib/units';

/** ASTM B263: weigh all stripped strands of a square-cut specimen. */
export function AreaFromMassCalculator() {
  const { system } = useUnits();
  const units = inputUnits[system];
  const [mass, setMass] = useUnitText('mass');
  const [length, setLength] = useUnitText('shortLength');
  const [material, setMaterial] = useState<MaterialId>('copper');
  const [k, setK] = useState(String(STANDARD_STRANDING_INCREMENT * 100));
  const [label, setLabel] = useState('');
  const calc = calcAreaFromMass({
    system,
    mass,
    length,
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
          label="Stripped mass"
          unit={units.mass}
          value={mass}
          onChange={setMass}
          error={errorOf('massG')}
        />
        <CalcField
          label="Cut length"
          unit={units.shortLength}
          value={length}
          onChange={setLength}
          error={errorOf('lengthMm')}
        />
        <MaterialField label="Assumed material" value={material} onChange={setMaterial} />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <CalcField
          label="Stranding increment"
          unit="%"
          value={k}
          onChange={setK}
          error={errorOf('strandingIncrement')}
          helperText="ASTM B496 standard: 2 %. 0 for a solid conductor."
        />
        <CalcField
          label="Compare with label"
          inputMode="text"
          value={label}
          onChange={setLabel}
          error={errorOf('label')}
          helperText="Optional, e.g. 4 AWG"
        />
      </Stack>
      <AreaOutcomeView calc={calc} />
    </Stack>
  );
}
