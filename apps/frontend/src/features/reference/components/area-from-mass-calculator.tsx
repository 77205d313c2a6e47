import { calcAreaFromMass } from '@/features/reference/calculations';
import { useAreaCommonInputs } from '@/features/reference/components/area-common-inputs';
import { AreaOutcomeView } from '@/features/reference/components/area-outcome-view';
import { CalculatorFrame } from '@/features/reference/components/calculator-frame';
import { useUnitText } from '@/features/reference/use-unit-text';
import { inputUnits, useUnits } from '@/lib/units';

/** ASTM B263: weigh all stripped strands of a square-cut specimen. */
export function AreaFromMassCalculator() {
  const { system } = useUnits();
  const units = inputUnits[system];
  const [mass, setMass] = useUnitText('mass');
  const [length, setLength] = useUnitText('shortLength');
  const common = useAreaCommonInputs({
    materialLabel: 'Assumed material',
    strandingHelp: 'ASTM B496 standard: 2 %. 0 for a solid conductor.',
    compareExample: '4 AWG',
  });
  const calc = calcAreaFromMass({ system, mass, length, ...common.values });
  return (
    <CalculatorFrame
      calc={calc}
      rows={[
        [
          {
            label: 'Stripped mass',
            unit: units.mass,
            value: mass,
            onChange: setMass,
            errorFor: 'massG',
          },
          {
            label: 'Cut length',
            unit: units.shortLength,
            value: length,
            onChange: setLength,
            errorFor: 'lengthMm',
          },
          common.material,
        ],
        [common.stranding, common.compare],
      ]}
    >
      {(outcome) => <AreaOutcomeView outcome={outcome} />}
    </CalculatorFrame>
  );
}
