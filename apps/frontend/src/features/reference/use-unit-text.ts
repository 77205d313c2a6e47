import { G_PER_LB, M_PER_FT, cmilToMm2, mm2ToCmil, mmToIn } from '@gaugeproof/standards';
import { useState } from 'react';
import { massToG, runLengthToMm, shortLengthToMm, useUnits, type UnitSystem } from '@/lib/units';

export type UnitQuantity = 'shortLength' | 'runLength' | 'mass' | 'area';

const toMetric: Record<UnitQuantity, (system: UnitSystem, v: number) => number> = {
  shortLength: shortLengthToMm,
  runLength: runLengthToMm,
  mass: massToG,
  area: (system, v) => (system === 'imperial' ? cmilToMm2(v) : v),
};
const fromMetric: Record<UnitQuantity, (system: UnitSystem, v: number) => number> = {
  shortLength: (system, mm) => (system === 'imperial' ? mmToIn(mm) : mm),
  runLength: (system, mm) => (system === 'imperial' ? mm / (M_PER_FT * 1000) : mm / 1000),
  mass: (system, g) => (system === 'imperial' ? g / G_PER_LB : g),
  area: (system, mm2) => (system === 'imperial' ? mm2ToCmil(mm2) : mm2),
};

/** Each number in `text` re-expressed from one system to the other (6 significant figures). */
export function convertText(
  text: string,
  quantity: UnitQuantity,
  from: UnitSystem,
  to: UnitSystem,
) {
  if (from === to) return text;
  return text.replace(/-?\d+(?:[.,]\d+)?/g, (token) => {
    const value = Number(token.replace(',', '.'));
    const converted = fromMetric[quantity](to, toMetric[quantity](from, value));
    return String(Number(converted.toPrecision(6)));
  });
}

/**
 * A calculator field typed in the units of the preference. When the preference changes, what
 * was typed is converted, so the result stays the same and nothing typed is lost.
 */
export function useUnitText(
  quantity: UnitQuantity,
  initial = '',
): [string, (text: string) => void] {
  const { system } = useUnits();
  const [state, setState] = useState({ text: initial, system });
  if (state.system !== system) {
    // Adjusting state while rendering, as React documents for values derived from props.
    const next = { text: convertText(state.text, quantity, state.system, system), system };
    setState(next);
    return [next.text, (text) => setState({ text, system })];
  }
  return [state.text, (text) => setState({ text, system })];
}
