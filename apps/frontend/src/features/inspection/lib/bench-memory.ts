import type { ResolutionSlot } from '@/features/inspection/lib/reading-methods';
import type { Instrument } from '@/features/inspection/types';

/**
 * What a bench remembers on this device (localStorage, not the account: a bench has its own
 * balance and rule whoever stands at it): the instrument chosen per slot and the cut length.
 */
const KEY = 'gaugeproof.bench.v1';

export interface BenchMemory {
  instruments: Partial<Record<ResolutionSlot, string>>;
  /** Field values a bench keeps from one piece to the next, keyed `method:field` (the cut length). */
  values: Record<string, string>;
}

const empty = (): BenchMemory => ({ instruments: {}, values: {} });

export function readBenchMemory(
  storage: Storage | undefined = globalThis.localStorage,
): BenchMemory {
  try {
    const raw = storage?.getItem(KEY);
    if (!raw) return empty();
    const parsed = JSON.parse(raw) as Partial<BenchMemory>;
    return {
      instruments:
        typeof parsed.instruments === 'object' && parsed.instruments ? parsed.instruments : {},
      values: typeof parsed.values === 'object' && parsed.values ? parsed.values : {},
    };
  } catch {
    return empty();
  }
}

export function writeBenchMemory(
  memory: BenchMemory,
  storage: Storage | undefined = globalThis.localStorage,
): void {
  try {
    storage?.setItem(KEY, JSON.stringify(memory));
  } catch {
    // A full or blocked storage only costs the clerk a choice next time.
  }
}

export interface RememberedInstruments {
  /** Remembered ids that may still be used, per slot. */
  usable: Partial<Record<ResolutionSlot, string>>;
  /** Why a remembered instrument was dropped (overdue, retired, gone from the register). */
  refused: string[];
}

/** Keeps the remembered instruments that are active and in calibration; says why the others went. */
export function checkRemembered(
  remembered: Partial<Record<ResolutionSlot, string>>,
  instruments: readonly Instrument[],
): RememberedInstruments {
  const usable: Partial<Record<ResolutionSlot, string>> = {};
  const refused: string[] = [];
  for (const [slot, id] of Object.entries(remembered) as [ResolutionSlot, string][]) {
    if (!id) continue;
    const found = instruments.find((i) => String(i.id) === id);
    if (!found) {
      refused.push(
        `Instrument #${id} used here before is no longer in the active register; choose another.`,
      );
    } else if (found.calibrationStatus === 'overdue') {
      refused.push(
        `${found.name} (${found.serial}) used here before is overdue for calibration since ${found.calibrationDueOn}; choose another or have it calibrated.`,
      );
    } else if (!found.active) {
      refused.push(`${found.name} (${found.serial}) has been retired; choose another.`);
    } else {
      usable[slot] = id;
    }
  }
  return { usable, refused };
}
