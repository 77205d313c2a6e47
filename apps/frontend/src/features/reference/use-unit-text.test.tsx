import { act, render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { convertText, useUnitText } from '@/features/reference/use-unit-text';
import { UnitsProvider, useUnits } from '@/lib/units';

describe('typed values follow the units preference', () => {
  it('converts every number typed, both ways', () => {
    // 1 in = 25.4 mm exactly; 1 ft = 0.3048 m exactly; 1 lb = 453.59237 g exactly (from memory).
    expect(convertText('25.4', 'shortLength', 'metric', 'imperial')).toBe('1');
    expect(convertText('0.5 0.51; 0,49', 'shortLength', 'imperial', 'metric')).toBe(
      '12.7 12.954; 12.446',
    );
    expect(convertText('3.048', 'runLength', 'metric', 'imperial')).toBe('10');
    expect(convertText('1', 'mass', 'imperial', 'metric')).toBe('453.592');
    // 8.367 mm² ≈ 16 510 cmil (REFERENCE §1, ASTM B258, which rounds to 4 figures).
    expect(Number(convertText('8.367', 'area', 'metric', 'imperial'))).toBeCloseTo(16512.5, 1);
    expect(convertText('', 'area', 'metric', 'imperial')).toBe('');
  });

  it('rewrites the field when the preference changes', () => {
    let units: ReturnType<typeof useUnits> | null = null;
    function Field() {
      units = useUnits();
      const [text, setText] = useUnitText('runLength', '5');
      return <input aria-label="run" value={text} onChange={(e) => setText(e.target.value)} />;
    }
    window.localStorage.clear();
    render(
      <UnitsProvider>
        <Field />
      </UnitsProvider>,
    );
    expect(screen.getByLabelText('run')).toHaveValue('5');
    act(() => units?.setSystem('imperial'));
    expect(screen.getByLabelText('run')).toHaveValue('16.4042');
    act(() => units?.setSystem('metric'));
    expect(screen.getByLabelText('run')).toHaveValue('5');
  });
});
