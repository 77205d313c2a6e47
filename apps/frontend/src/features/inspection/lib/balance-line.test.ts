import { describe, expect, it } from 'vitest';
import {
  LineSplitter,
  parseBalanceLine,
  StableWeight,
} from '@/features/inspection/lib/balance-line';

// Lines recorded from the continuous and print outputs the README lists (as a balance
// sends them, with their CR/LF); values invented.
describe('parseBalanceLine', () => {
  it.each([
    ['ST,GS,+00195.04  g\r\n', 195.04, true],
    ['US,GS,+00190.12  g\r\n', 190.12, false],
    ['ST,NT,-00000.50  g\r\n', -0.5, true],
    ['ST,GS,+0.19504 kg\r\n', 195.04, true],
    ['S S     195.04 g\r\n', 195.04, true],
    ['S D     194.98 g\r\n', 194.98, false],
    ['+   195.04 g\r\n', 195.04, null],
    ['195.04g\n', 195.04, null],
    ['N  +195.04 g\r\n', 195.04, null],
    ['?  +194.90 g\r\n', 194.9, false],
    ['   194.90 g ?\r\n', 194.9, false],
    ['195040 mg\r\n', 195.04, null],
    ['195,04 g\r\n', 195.04, null],
  ])('reads %j as %f g (stable: %s)', (line, grams, stable) => {
    const read = parseBalanceLine(line);
    expect(read.kind).toBe('mass');
    if (read.kind !== 'mass') return;
    expect(read.grams).toBeCloseTo(grams, 9);
    expect(read.stable).toBe(stable);
  });

  it.each(['OL,GS,+99999.99  g\r\n', 'S +\r\n', 'S -\r\n'])('reads %j as out of range', (line) => {
    expect(parseBalanceLine(line).kind).toBe('overload');
  });

  it.each([
    '  12.30 lb\r\n',
    'ST,GS,+00195.04 oz\r\n',
    'Tare\r\n',
    'S I\r\n',
    '195.04\r\n',
    'QT,GS,+00012 PC\r\n',
    '',
  ])('does not guess at %j and keeps it raw', (line) => {
    const read = parseBalanceLine(line);
    expect(read.kind).toBe('unknown');
    expect(read.raw).toBe(line.replace(/[\r\n]+$/, ''));
  });
});

describe('StableWeight', () => {
  it('takes a flagged stable line at once and never an unstable one', () => {
    const s = new StableWeight();
    expect(s.push(parseBalanceLine('US,GS,+00190.12  g'))).toBeNull();
    expect(s.push(parseBalanceLine('ST,GS,+00195.04  g'))).toBe(195.04);
  });

  it('waits for three equal unflagged values in a row', () => {
    const s = new StableWeight();
    const lines = ['195.01 g', '195.04 g', '195.04 g', 'junk', '195.04 g', '195.04 g', '195.04 g'];
    expect(lines.map((l) => s.push(parseBalanceLine(l)))).toEqual([
      null,
      null,
      null,
      null,
      null,
      null,
      195.04,
    ]);
  });
});

describe('LineSplitter', () => {
  it('splits CR, LF and CR LF across chunks', () => {
    const split = new LineSplitter();
    expect(split.push('ST,GS,+001')).toEqual([]);
    expect(split.push('95.04  g\r\nS S  1 g\rA')).toEqual(['ST,GS,+00195.04  g', 'S S  1 g']);
    expect(split.push('\n')).toEqual(['A']);
  });
});
