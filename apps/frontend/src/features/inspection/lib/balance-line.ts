/**
 * Plain-text output lines of bench balances (continuous or print output, one line per
 * value, ending CR/LF). Only the shapes below are understood; anything else is shown raw
 * and never guessed at. Formats as commonly printed by bench balances (from memory, checked
 * against the recorded lines in balance-line.test.ts, no published source):
 *
 * 1. Two-letter header, comma, data type: `ST,GS,+00195.04  g` — ST stable, US unstable,
 *    OL overload; GS gross, NT net, TR tare.
 * 2. Status letters before the value: `S S     195.04 g` — S stable, D dynamic (unstable),
 *    `S +` / `S -` over / under the range, `S I` busy.
 * 3. A bare value with its unit: `+   195.04 g`, `195.04g`, `N  +195.04 g` (N/G net, gross),
 *    with `?` before or after for an unstable value. Without a flag, stability is unknown:
 *    the reader waits for the same value on consecutive lines.
 *
 * Units: g, kg, mg (converted to grams). Another unit is not understood.
 */
export type BalanceLine =
  | { kind: 'mass'; grams: number; stable: boolean | null; text: string; raw: string }
  | { kind: 'overload'; raw: string }
  | { kind: 'unknown'; raw: string };

const UNIT_TO_G: Record<string, number> = { g: 1, kg: 1000, mg: 0.001 };

const VALUE = String.raw`([+-]?)\s*(\d+(?:[.,]\d+)?|[.,]\d+)\s*(kg|mg|g)`;

/** The value as the clerk reads it: sign, digits without padding zeros, unit. */
const shown = (sign: string, digits: string, unit: string) =>
  `${sign === '-' ? '-' : ''}${digits.replace(/^0+(?=\d)/, '')} ${unit}`;

function mass(sign: string, digits: string, unit: string) {
  const value = Number(digits.replace(',', '.')) * (sign === '-' ? -1 : 1);
  return value * UNIT_TO_G[unit.toLowerCase()];
}

/** Reads one line (without or with its CR/LF). */
export function parseBalanceLine(line: string): BalanceLine {
  const raw = line.replace(/[\r\n]+$/, '');
  const text = raw.trim();
  if (text === '') return { kind: 'unknown', raw };

  const header = new RegExp(String.raw`^(ST|US|OL|QT),(GS|NT|TR)\s*,?\s*${VALUE}\s*$`, 'i').exec(
    text,
  );
  if (header) {
    const [, status, , sign, digits, unit] = header;
    const s = status!.toUpperCase();
    if (s === 'OL') return { kind: 'overload', raw };
    if (s === 'QT') return { kind: 'unknown', raw };
    return {
      kind: 'mass',
      grams: mass(sign!, digits!, unit!),
      stable: s === 'ST',
      text: shown(sign!, digits!, unit!),
      raw,
    };
  }
  if (/^OL,/i.test(text)) return { kind: 'overload', raw };

  const status = new RegExp(String.raw`^S\s+([SD])\s+${VALUE}\s*$`, 'i').exec(text);
  if (status) {
    const [, flag, sign, digits, unit] = status;
    return {
      kind: 'mass',
      grams: mass(sign!, digits!, unit!),
      stable: flag!.toUpperCase() === 'S',
      text: shown(sign!, digits!, unit!),
      raw,
    };
  }
  if (/^S\s+[+-]\s*$/i.test(text)) return { kind: 'overload', raw };

  const bare = new RegExp(String.raw`^(\?)?\s*(?:[NG]\s+)?${VALUE}\s*(\?)?$`, 'i').exec(text);
  if (bare) {
    const [, before, sign, digits, unit, after] = bare;
    return {
      kind: 'mass',
      grams: mass(sign!, digits!, unit!),
      stable: before || after ? false : null,
      text: shown(sign!, digits!, unit!),
      raw,
    };
  }
  return { kind: 'unknown', raw };
}

/**
 * Decides when a stream of lines shows a settled weight: at once for a line the balance
 * flags stable; for lines without a flag, after `repeats` equal values in a row.
 */
export class StableWeight {
  private lastGrams: number | null = null;
  private count = 0;
  constructor(private readonly repeats = 3) {}

  /** The settled weight in grams this line completes, or null. */
  push(line: BalanceLine): number | null {
    if (line.kind !== 'mass') {
      this.lastGrams = null;
      this.count = 0;
      return null;
    }
    if (line.stable === true) return line.grams;
    if (line.stable === false) {
      this.lastGrams = null;
      this.count = 0;
      return null;
    }
    this.count = this.lastGrams === line.grams ? this.count + 1 : 1;
    this.lastGrams = line.grams;
    return this.count === this.repeats ? line.grams : null;
  }
}

/** Splits a stream of text into lines ending CR, LF or CR LF. */
export class LineSplitter {
  private rest = '';
  push(chunk: string): string[] {
    const parts = (this.rest + chunk).split(/\r\n|\r|\n/);
    this.rest = parts.pop() ?? '';
    return parts;
  }
}
