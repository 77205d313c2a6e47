import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CrossSectionDrawing } from '@/features/inspection/components/cross-section-drawing';
import { UnitsProvider } from '@/lib/units';

describe('CrossSectionDrawing', () => {
  it('draws the 4 AWG label and the 8.39 mm² measurement with circle areas in proportion', () => {
    render(
      <UnitsProvider>
        <CrossSectionDrawing
          gauge="4 AWG"
          nominalAreaMm2={21.15}
          measuredAreaMm2={8.392}
          measuresAs="8 AWG"
        />
      </UnitsProvider>,
    );
    const drawing = screen.getByRole('img', {
      name: 'Cross-sections to scale: 4 AWG label 21.15 mm²; measured 8.39 mm² (≈ 8 AWG).',
    });
    const [labelled, measured] = [...drawing.querySelectorAll('circle')].map((c) =>
      Number(c.getAttribute('r')),
    );
    expect(labelled).toBeCloseTo(70, 6);
    expect(((measured ?? 0) / (labelled ?? 1)) ** 2).toBeCloseTo(8.392 / 21.15, 6);
    expect(drawing).toHaveTextContent('≈ 8 AWG');
  });
});
