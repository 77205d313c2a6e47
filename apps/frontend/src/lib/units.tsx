import { G_PER_LB, M_PER_FT, inToMm, mm2ToCmil, mmToIn } from '@gaugeproof/standards';
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';

/**
 * The units preference: metric (mm, m, g, mm²) or imperial (in, ft, lb, circular mil).
 * Every conversion factor comes from @gaugeproof/standards; none is typed here.
 * Values are always stored and sent in metric; only what is shown changes.
 */
export type UnitSystem = 'metric' | 'imperial';

export const UNITS_STORAGE_KEY = 'gaugeproof.units';

const MM_PER_FT = M_PER_FT * 1000;

function fixed(value: number, digits: number): string {
  return new Intl.NumberFormat('en-US', {
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
  }).format(value);
}

/** A length such as a sample cut (mm) or a cable run (m, ft). */
export function formatLengthMm(system: UnitSystem, mm: number): string {
  if (system === 'imperial') {
    const inches = mmToIn(mm);
    return Math.abs(inches) < 12 ? `${fixed(inches, 2)} in` : `${fixed(mm / MM_PER_FT, 2)} ft`;
  }
  return Math.abs(mm) < 1000 ? `${fixed(mm, 1)} mm` : `${fixed(mm / 1000, 2)} m`;
}

/** A sample mass: grams (kg from 1000 g) or pounds. */
export function formatMassG(system: UnitSystem, g: number): string {
  if (system === 'imperial') {
    const lb = g / G_PER_LB;
    return `${fixed(lb, Math.abs(lb) < 1 ? 4 : 2)} lb`;
  }
  return Math.abs(g) < 1000 ? `${fixed(g, 2)} g` : `${fixed(g / 1000, 3)} kg`;
}

/** A conductor cross-section: mm² or circular mils (whole cmil with thousands separators). */
export function formatAreaMm2(system: UnitSystem, mm2: number): string {
  if (system === 'imperial') return `${fixed(mm2ToCmil(mm2), 0)} cmil`;
  const digits = Math.abs(mm2) < 1 ? 3 : Math.abs(mm2) < 100 ? 2 : 1;
  return `${fixed(mm2, digits)} mm²`;
}

/** A wire or strand diameter: mm (3 decimals) or inches (4 decimals, as AWG tables give). */
export function formatDiameterMm(system: UnitSystem, mm: number): string {
  return system === 'imperial' ? `${fixed(mmToIn(mm), 4)} in` : `${fixed(mm, 3)} mm`;
}

/** A resistance, the same in both systems: mΩ below 1 Ω. */
export function formatResistanceOhm(ohm: number): string {
  return Math.abs(ohm) < 1 ? `${fixed(ohm * 1000, 3)} mΩ` : `${fixed(ohm, 4)} Ω`;
}

/** Input units for a form field that follows the preference. */
export const inputUnits = {
  metric: { shortLength: 'mm', runLength: 'm', mass: 'g' },
  imperial: { shortLength: 'in', runLength: 'ft', mass: 'lb' },
} as const;

/** A typed short length (mm or in) back to millimetres. */
export const shortLengthToMm = (system: UnitSystem, value: number): number =>
  system === 'imperial' ? inToMm(value) : value;
/** A typed run length (m or ft) back to millimetres. */
export const runLengthToMm = (system: UnitSystem, value: number): number =>
  system === 'imperial' ? value * MM_PER_FT : value * 1000;
/** A typed mass (g or lb) back to grams. */
export const massToG = (system: UnitSystem, value: number): number =>
  system === 'imperial' ? value * G_PER_LB : value;

export interface Units {
  system: UnitSystem;
  setSystem: (system: UnitSystem) => void;
  formatLengthMm: (mm: number) => string;
  formatMassG: (g: number) => string;
  formatAreaMm2: (mm2: number) => string;
  formatDiameterMm: (mm: number) => string;
  formatResistanceOhm: (ohm: number) => string;
}

function readStored(): UnitSystem {
  try {
    return window.localStorage.getItem(UNITS_STORAGE_KEY) === 'imperial' ? 'imperial' : 'metric';
  } catch {
    return 'metric'; // storage blocked: fall back quietly
  }
}

const UnitsContext = createContext<Units | null>(null);

export function UnitsProvider({ children }: { children: ReactNode }) {
  const [system, setState] = useState<UnitSystem>(readStored);
  const setSystem = useCallback((next: UnitSystem) => {
    setState(next);
    try {
      window.localStorage.setItem(UNITS_STORAGE_KEY, next);
    } catch {
      // storage blocked: the choice lasts for this page only
    }
  }, []);
  const value = useMemo<Units>(
    () => ({
      system,
      setSystem,
      formatLengthMm: (mm) => formatLengthMm(system, mm),
      formatMassG: (g) => formatMassG(system, g),
      formatAreaMm2: (mm2) => formatAreaMm2(system, mm2),
      formatDiameterMm: (mm) => formatDiameterMm(system, mm),
      formatResistanceOhm,
    }),
    [system, setSystem],
  );
  return <UnitsContext.Provider value={value}>{children}</UnitsContext.Provider>;
}

export function useUnits(): Units {
  const units = useContext(UnitsContext);
  if (!units) throw new Error('useUnits must be used inside UnitsProvider');
  return units;
}
