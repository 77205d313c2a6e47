import { describe, expect, it } from 'vitest';
import { fieldText, lotOfTag } from './scan-codes';

const ORIGIN = 'https://qa.example.test';

describe('lotOfTag', () => {
  it('reads a held lot tag (bench mode) from any public address the server prints', () => {
    expect(lotOfTag('https://qa.example.test/lots/42/bench', ORIGIN)).toEqual({
      lotId: 42,
      bench: true,
    });
    expect(lotOfTag('http://10.0.0.5:3000/lots/7/bench', ORIGIN)).toEqual({
      lotId: 7,
      bench: true,
    });
  });

  it('reads a decided lot tag only from this origin', () => {
    expect(lotOfTag('https://qa.example.test/lots/42', ORIGIN)).toEqual({
      lotId: 42,
      bench: false,
    });
    expect(lotOfTag('https://supplier.example.test/lots/42', ORIGIN)).toBeNull();
  });

  it('takes nothing else for a tag', () => {
    for (const text of [
      'PO-4411',
      'lots/42/bench',
      'ftp://qa.example.test/lots/42/bench',
      'https://qa.example.test/lots/0/bench',
      'https://qa.example.test/lots/42/photos',
      'https://qa.example.test/lots/9999999999999999/bench',
      'javascript:alert(1)//lots/1/bench',
    ]) {
      expect(lotOfTag(text, ORIGIN), text).toBeNull();
    }
  });
});

describe('fieldText', () => {
  it('turns a GS1 group separator and a printer CR into single spaces and trims', () => {
    expect(fieldText('\u001d10SL-0412\u001d21 77\r\n', 64)).toBe('10SL-0412 21 77');
  });
  it('cuts to the field length', () => {
    expect(fieldText('A'.repeat(80), 64)).toHaveLength(64);
  });
});
