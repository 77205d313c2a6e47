import { STANDARD_STRANDING_INCREMENT, type MaterialId } from '@gaugeproof/standards';
import { useState } from 'react';
import type { CalculatorInput } from '@/features/reference/components/calculator-frame';

/**
 * The inputs the mass and the resistance calculators share: the material, the stranding
 * increment (ASTM B496's 2 % to start with) and the label to compare with. `values` goes
 * into the calculation, the inputs into the frame's rows.
 */
export function useAreaCommonInputs(texts: {
  materialLabel: string;
  strandingHelp?: string;
  compareExample: string;
}) {
  const [material, setMaterial] = useState<MaterialId>('copper');
  const [k, setK] = useState(String(STANDARD_STRANDING_INCREMENT * 100));
  const [label, setLabel] = useState('');
  return {
    values: { material, strandingIncrementPercent: k, compareLabel: label },
    material: { label: texts.materialLabel, material, onChange: setMaterial },
    stranding: {
      label: 'Stranding increment',
      unit: '%',
      value: k,
      onChange: setK,
      errorFor: 'strandingIncrement',
      helperText: texts.strandingHelp,
    },
    compare: {
      label: 'Compare with label',
      inputMode: 'text',
      value: label,
      onChange: setLabel,
      errorFor: 'label',
      helperText: `Optional, e.g. ${texts.compareExample}`,
    },
  } satisfies { values: unknown } & Record<'material' | 'stranding' | 'compare', CalculatorInput>;
}
