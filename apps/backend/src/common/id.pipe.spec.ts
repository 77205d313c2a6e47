import { BadRequestException } from '@nestjs/common';
import { describe, expect, it } from 'vitest';
import { IdPipe } from './id.pipe';
import { MAX_ID } from './validators';

const meta = { type: 'param', data: 'id' } as const;

describe('IdPipe', () => {
  it('reads a record id', () => {
    expect(new IdPipe().transform('1', meta)).toBe(1);
    expect(new IdPipe().transform(String(MAX_ID), meta)).toBe(MAX_ID);
  });

  it('refuses what cannot name a record, with one sentence', () => {
    for (const bad of [
      '0',
      '-1',
      '1.5',
      '1e3',
      ' 1',
      'abc',
      '',
      '2147483648',
      '99999999999999999999',
    ]) {
      expect(() => new IdPipe().transform(bad, meta), bad).toThrow(BadRequestException);
    }
    expect(() => new IdPipe().transform('x', meta)).toThrow(
      'id must be a record id: a whole number from 1 to 2147483647',
    );
  });
});
