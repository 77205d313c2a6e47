import { describe, expect, it } from 'vitest';
import { StandardsInputError } from '../errors.js';
import { formatGaugeLabel } from './format.js';
import { METRIC_AREAS_MM2, METRIC_SIZES } from './metric.js';
import { parseGauge } from './parse.js';

describe('parseGauge', () => {
  it.each([
    ['4', '4 AWG'],
    ['4 AWG', '4 AWG'],
    ['4 ga', '4 AWG'],
    ['4 Gauge', '4 AWG'],
    ['#4', '4 AWG'],
    ['4AWG', '4 AWG'],
    ['  8  awg ', '8 AWG'],
    ['1/0', '1/0 AWG'],
    ['0', '1/0 AWG'],
    ['00', '2/0 AWG'],
    ['000', '3/0 AWG'],
    ['0000', '4/0 AWG'],
    ['2/0 AWG', '2/0 AWG'],
    ['4/0 ga', '4/0 AWG'],
    ['25 mm²', '25 mm²'],
    ['25 mm2', '25 mm²'],
    ['25 sq mm', '25 mm²'],
    ['25mm²', '25 mm²'],
    ['2,5 mm²', '2.5 mm²'],
    ['0.75 mm2', '0.75 mm²'],
  ])('reads %j as %s (issue 3 label forms)', (label, canonical) => {
    expect(parseGauge(label).label).toBe(canonical);
  });

  it('gives the B258 geometry and gauge number (ASTM B258; REFERENCE §1)', () => {
    expect(parseGauge('2/0')).toMatchObject({ system: 'awg', awg: -1 });
    expect(parseGauge('4 AWG')).toMatchObject({
      awg: 4,
      nominalAreaMm2: 21.15,
      nominalAreaCmil: 41740,
    });
    expect(parseGauge('25 mm²')).toEqual({ system: 'metric', label: '25 mm²', nominalAreaMm2: 25 });
  });

  it.each(['', 'four', '5/0', '41', '4 SAE', 'SAE 4', '26 mm²', '-4', '4.5', 'mm²'])(
    'refuses %j with a StandardsInputError on label',
    (label) => {
      expect(() => parseGauge(label)).toThrow(StandardsInputError);
      try {
        parseGauge(label);
      } catch (e) {
        expect((e as StandardsInputError).field).toBe('label');
      }
    },
  );
});

describe('metric sizes (IEC 60228 series, from memory)', () => {
  it('runs 0.5 … 240 mm²', () => {
    expect(METRIC_AREAS_MM2[0]).toBe(0.5);
    expect(METRIC_AREAS_MM2.at(-1)).toBe(240);
    expect(METRIC_SIZES.map((g) => g.nominalAreaMm2)).toEqual([...METRIC_AREAS_MM2]);
    // REFERENCE §4 quotes 6, 10, 16, 25, 35, 50 mm² (IEC 60228): all in the series.
    for (const a of [6, 10, 16, 25, 35, 50]) expect(METRIC_AREAS_MM2).toContain(a);
  });
});

describe('formatGaugeLabel', () => {
  it('writes canonical labels (issue 3)', () => {
    expect(formatGaugeLabel(-1)).toBe('2/0 AWG');
    expect(formatGaugeLabel(0)).toBe('1/0 AWG');
    expect(formatGaugeLabel(4)).toBe('4 AWG');
    expect(formatGaugeLabel(25, 'metric')).toBe('25 mm²');
    expect(formatGaugeLabel(parseGauge('#4'))).toBe('4 AWG');
    expect(formatGaugeLabel(parseGauge('2,5 mm2'))).toBe('2.5 mm²');
  });

  it('refuses sizes off the series', () => {
    expect(() => formatGaugeLabel(41)).toThrow(StandardsInputError);
    expect(() => formatGaugeLabel(26, 'metric')).toThrow(StandardsInputError);
  });
});
