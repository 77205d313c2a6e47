import { act, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  UNITS_STORAGE_KEY,
  UnitsProvider,
  formatAreaMm2,
  formatDiameterMm,
  formatLengthMm,
  formatMassG,
  formatResistanceOhm,
  massToG,
  runLengthToMm,
  shortLengthToMm,
  useUnits,
} from '@/lib/units';

describe('unit formatting', () => {
  it('shows areas in mm² or whole circular mils', () => {
    expect(formatAreaMm2('metric', 21.15)).toBe('21.15 mm²');
    expect(formatAreaMm2('metric', 0.519)).toBe('0.519 mm²');
    // 4 AWG = 41 740 cmil = 21.15 mm² (REFERENCE §1, ASTM B258 table): 21.15 mm² → 41 740 cmil.
    expect(formatAreaMm2('imperial', 21.15)).toBe('41,740 cmil');
  });

  it('shows diameters in mm or inches with four decimals', () => {
    // 4 AWG: 0.2043 in = 5.189 mm (ASTM B258).
    expect(formatDiameterMm('metric', 5.18922)).toBe('5.189 mm');
    expect(formatDiameterMm('imperial', 5.18922)).toBe('0.2043 in');
  });

  it('shows short lengths in mm or in, long ones in m or ft', () => {
    expect(formatLengthMm('metric', 250)).toBe('250.0 mm');
    expect(formatLengthMm('metric', 4500)).toBe('4.50 m');
    expect(formatLengthMm('imperial', 254)).toBe('10.00 in');
    expect(formatLengthMm('imperial', 3048)).toBe('10.00 ft');
  });

  it('shows masses in g, kg or lb', () => {
    expect(formatMassG('metric', 47.5)).toBe('47.50 g');
    expect(formatMassG('metric', 2500)).toBe('2.500 kg');
    expect(formatMassG('imperial', 453.59237)).toBe('1.00 lb');
    expect(formatMassG('imperial', 45.359237)).toBe('0.1000 lb');
  });

  it('shows resistance in mΩ below one ohm', () => {
    expect(formatResistanceOhm(0.00123)).toBe('1.230 mΩ');
    expect(formatResistanceOhm(2.5)).toBe('2.5000 Ω');
  });

  it('turns typed values back into metric', () => {
    expect(shortLengthToMm('imperial', 1)).toBeCloseTo(25.4, 10);
    expect(shortLengthToMm('metric', 7)).toBe(7);
    expect(runLengthToMm('imperial', 10)).toBeCloseTo(3048, 9);
    expect(runLengthToMm('metric', 3)).toBe(3000);
    expect(massToG('imperial', 1)).toBeCloseTo(453.59237, 9);
  });
});

function Probe() {
  const units = useUnits();
  return (
    <div>
      <span data-testid="area">{units.formatAreaMm2(21.15)}</span>
      <button onClick={() => units.setSystem('imperial')}>imperial</button>
    </div>
  );
}

describe('UnitsProvider', () => {
  beforeEach(() => window.localStorage.clear());

  it('starts metric, switches and remembers the choice', async () => {
    const user = userEvent.setup();
    const { unmount } = render(
      <UnitsProvider>
        <Probe />
      </UnitsProvider>,
    );
    expect(screen.getByTestId('area')).toHaveTextContent('21.15 mm²');
    await user.click(screen.getByRole('button', { name: 'imperial' }));
    expect(screen.getByTestId('area')).toHaveTextContent('41,740 cmil');
    expect(window.localStorage.getItem(UNITS_STORAGE_KEY)).toBe('imperial');
    unmount();

    render(
      <UnitsProvider>
        <Probe />
      </UnitsProvider>,
    );
    expect(screen.getByTestId('area')).toHaveTextContent('cmil');
  });

  it('refuses to work outside the provider', () => {
    const spy = console.error;
    console.error = () => undefined;
    expect(() => act(() => render(<Probe />))).toThrow(/UnitsProvider/);
    console.error = spy;
  });
});
