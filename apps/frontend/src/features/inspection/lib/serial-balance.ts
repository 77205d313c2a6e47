import {
  LineSplitter,
  parseBalanceLine,
  StableWeight,
  type BalanceLine,
} from '@/features/inspection/lib/balance-line';

/** The part of the Web Serial API the reader uses (Chromium; not in TypeScript's DOM types). */
interface SerialPortLike {
  open(options: { baudRate: number }): Promise<void>;
  close(): Promise<void>;
  readonly readable: ReadableStream<Uint8Array> | null;
}
interface SerialLike {
  getPorts(): Promise<SerialPortLike[]>;
  requestPort(options?: object): Promise<SerialPortLike>;
}

const serialOf = (): SerialLike | undefined =>
  (globalThis.navigator as (Navigator & { serial?: SerialLike }) | undefined)?.serial;

export const serialAvailable = (): boolean => serialOf() !== undefined;

/** 9600 baud, 8 data bits, no parity, 1 stop bit: a usual factory setting (common practice, no source). */
export const DEFAULT_BAUD_RATE = 9600;

export interface BalanceEvents {
  onLine: (line: BalanceLine) => void;
  onStable: (grams: number) => void;
  onClosed: (error: unknown) => void;
}

/**
 * One balance on a serial port, read line by line until closed. The port the clerk picked
 * once is granted to the site, so the next connect on this device finds it with getPorts()
 * without asking again.
 */
export class BalanceReader {
  private reader: ReadableStreamDefaultReader<string> | null = null;
  private listeners = new Set<BalanceEvents>();
  private closed = false;

  private constructor(private readonly port: SerialPortLike) {}

  static async connect(baudRate = DEFAULT_BAUD_RATE): Promise<BalanceReader> {
    const serial = serialOf();
    if (!serial) throw new Error('This browser cannot reach serial ports; type the value.');
    const [granted] = await serial.getPorts();
    const port = granted ?? (await serial.requestPort());
    await port.open({ baudRate });
    const reader = new BalanceReader(port);
    void reader.pump();
    return reader;
  }

  subscribe(events: BalanceEvents): () => void {
    this.listeners.add(events);
    return () => this.listeners.delete(events);
  }

  get isOpen() {
    return !this.closed;
  }

  private async pump() {
    const split = new LineSplitter();
    const stable = new StableWeight();
    let failure: unknown = null;
    try {
      if (!this.port.readable) throw new Error('The serial port cannot be read.');
      this.reader = this.port.readable
        .pipeThrough(new TextDecoderStream() as unknown as TransformStream<Uint8Array, string>)
        .getReader();
      for (;;) {
        const { value, done } = await this.reader.read();
        if (done) break;
        for (const text of split.push(value)) {
          if (text.trim() === '') continue;
          const line = parseBalanceLine(text);
          const grams = stable.push(line);
          for (const l of this.listeners) {
            l.onLine(line);
            if (grams !== null) l.onStable(grams);
          }
        }
      }
    } catch (error) {
      failure = error;
    } finally {
      this.closed = true;
      for (const l of this.listeners) l.onClosed(failure);
      if (shared === this) shared = null;
    }
  }

  async close() {
    this.closed = true;
    await this.reader?.cancel().catch(() => undefined);
    await this.port.close().catch(() => undefined);
  }
}

let shared: BalanceReader | null = null;

/** The bench's balance connection, kept from one piece to the next while the page lives. */
export async function sharedBalance(): Promise<BalanceReader> {
  if (shared?.isOpen) return shared;
  shared = await BalanceReader.connect();
  return shared;
}

export const connectedBalance = (): BalanceReader | null => (shared?.isOpen ? shared : null);
