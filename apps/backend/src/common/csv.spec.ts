import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { csvBuffer, csvChunks, csvLines, csvStream, neutralise } from './csv';

describe('csv', () => {
  it('neutralises cells a spreadsheet would run as formulas (OWASP CSV injection)', () => {
    for (const bad of ['=HYPERLINK("x")', '+1+1', '-2+3', '@SUM(A1)', '\tx', '\rx']) {
      expect(neutralise(bad)).toBe(`'${bad}`);
    }
    expect(neutralise('4 AWG')).toBe('4 AWG');
    expect(neutralise(-1.5)).toBe(-1.5);
    expect(neutralise(null)).toBe('');
  });

  it('writes header and rows with quoting that papaparse reads back', async () => {
    const buf = await csvBuffer(['a', 'b'], [[['x, y', 'say "hi"']], [['=1', 2]]]);
    const text = buf.toString('utf8');
    expect(text.startsWith('\ufeff')).toBe(true);
    const parsed = Papa.parse<string[]>(text.slice(1).trim(), { newline: '\r\n' });
    expect(parsed.data).toEqual([
      ['a', 'b'],
      ['x, y', 'say "hi"'],
      ["'=1", '2'],
    ]);
  });

  it('streams block by block without building the file first', async () => {
    let produced = 0;
    async function* blocks() {
      for (let i = 0; i < 3; i++) {
        produced++;
        yield [[i, `row ${i}`]];
      }
    }
    const seen: number[] = [];
    for await (const chunk of csvChunks(['n', 'label'], blocks()))
      seen.push(produced, chunk.length);
    // the header leaves before any block is produced, each block before the next is read
    expect(seen.filter((_, i) => i % 2 === 0)).toEqual([0, 1, 2, 3]);
    let text = '';
    for await (const chunk of csvStream(['n'], [[[1]], [[2]]])) text += String(chunk);
    expect(text).toBe('\ufeffn\r\n1\r\n2\r\n');
  });
});

describe('csvLines', () => {
  it('quotes a field holding a semicolon, so a semicolon-locale spreadsheet keeps it whole', () => {
    expect(csvLines([['Cable;=1+1', 'a,b', 'plain']])).toBe('"Cable;=1+1","a,b",plain\r\n');
    const [row] = Papa.parse<string[]>(csvLines([['x;=HYPERLINK("y")']]), { delimiter: ';' }).data;
    expect(row).toEqual(['x;=HYPERLINK("y")']);
  });

  it('writes what papaparse reads back, for any cells (RFC 4180 quoting)', () => {
    const cell = fc.oneof(
      fc.string({ unit: fc.constantFrom('a', ' ', ',', '"', '\r', '\n', 'é', '=', '-', 'x') }),
      fc.double({ noNaN: true, noDefaultInfinity: true }),
      fc.boolean(),
      fc.constant(null),
    );
    fc.assert(
      fc.property(
        fc.array(fc.array(cell, { minLength: 2, maxLength: 5 }), { minLength: 1 }),
        (rows) => {
          const text = csvLines(rows);
          const back = Papa.parse<string[]>(text.slice(0, -2), { newline: '\r\n' }).data;
          expect(back).toEqual(rows.map((r) => r.map((c) => String(neutralise(c)))));
        },
      ),
    );
  });
});
