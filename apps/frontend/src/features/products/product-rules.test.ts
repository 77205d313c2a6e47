import { describe, expect, it } from 'vitest';
import {
  EMPTY_PRODUCT,
  productSchema,
  toProductBody,
} from '@/features/products/api/create-product';
import { groundIsSmaller, kitWarnings, previewGauge } from '@/features/products/product-rules';

describe('gauge labels', () => {
  it('shows the canonical label and nominal area of what is typed', () => {
    const preview = previewGauge('1/0');
    expect(preview.ok && preview.gauge.label).toBe('1/0 AWG');
    // 1/0 AWG = 53.49 mm² (REFERENCE §1, ASTM B258).
    expect(preview.ok && preview.gauge.nominalAreaMm2).toBe(53.49);
    expect(previewGauge('4 ga')).toMatchObject({ ok: true });
    expect(previewGauge('4 SAE')).toMatchObject({ ok: false });
    expect(previewGauge('7 mm²')).toMatchObject({ ok: false });
  });
});

describe('kit warning', () => {
  const power = { purpose: 'power' as const, gauge: '4 AWG' };
  it('warns when ground is not sized like power', () => {
    const conductors = [power, { purpose: 'ground' as const, gauge: '8' }];
    expect(kitWarnings(conductors)).toEqual([
      'Power is 4 AWG but ground is 8 AWG: ground should be sized like power (common practice).',
    ]);
    expect(groundIsSmaller(conductors)).toBe(true);
  });

  it('is quiet when the labels name the same size, or a label is unreadable', () => {
    expect(kitWarnings([power, { purpose: 'ground', gauge: '4 ga' }])).toEqual([]);
    expect(kitWarnings([power, { purpose: 'ground', gauge: '' }])).toEqual([]);
    expect(kitWarnings([power, { purpose: 'remote', gauge: '18' }])).toEqual([]);
  });
});

describe('product form', () => {
  const valid = {
    ...EMPTY_PRODUCT,
    supplierId: '3',
    sku: 'AK-4',
    kind: 'kit' as const,
    description: '4 AWG amplifier kit',
    conductors: [
      {
        purpose: 'power' as const,
        gauge: '4',
        claimedMaterial: 'copper' as const,
        claimedStrands: '',
      },
      {
        purpose: 'ground' as const,
        gauge: '4 ga',
        claimedMaterial: 'copper' as const,
        claimedStrands: '420',
      },
    ],
  };

  it('defaults to S-3, AQL 1.0 and 98 %', () => {
    expect(EMPTY_PRODUCT.inspectionLevel).toBe('S-3');
    expect(EMPTY_PRODUCT.aql).toBe('1.0');
    expect(EMPTY_PRODUCT.minAreaRatioPercent).toBe('98');
  });

  it('turns the form into the POST body with canonical labels', () => {
    expect(productSchema.safeParse(valid).success).toBe(true);
    expect(toProductBody(valid)).toEqual({
      supplierId: 3,
      sku: 'AK-4',
      kind: 'kit',
      description: '4 AWG amplifier kit',
      lengthPerUnitM: null,
      inspectionLevel: 'S-3',
      aql: '1.0',
      minAreaRatio: 0.98,
      conductors: [
        { purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper', claimedStrands: null },
        { purpose: 'ground', gauge: '4 AWG', claimedMaterial: 'copper', claimedStrands: 420 },
      ],
    });
  });

  it('refuses bad input with a message per field', () => {
    const result = productSchema.safeParse({
      ...valid,
      supplierId: '',
      minAreaRatioPercent: '120',
      lengthPerUnitM: '-1',
      conductors: [{ ...valid.conductors[0], gauge: 'fat', claimedStrands: '1.5' }],
    });
    expect(result.success).toBe(false);
    const paths = result.error?.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(
      expect.arrayContaining([
        'supplierId',
        'minAreaRatioPercent',
        'lengthPerUnitM',
        'conductors.0.gauge',
        'conductors.0.claimedStrands',
      ]),
    );
    expect(productSchema.safeParse({ ...valid, conductors: [] }).success).toBe(false);
  });
});
