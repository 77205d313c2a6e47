/**
 * A small seeded pseudo-random generator (mulberry32, public domain) so the demo history is
 * the same on every first start. Only the raw readings use it; every result is computed.
 */
export class SeedRandom {
  private state: number;

  constructor(seed: number) {
    this.state = seed >>> 0;
  }

  /** Uniform in [0, 1). */
  next(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    let t = this.state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }

  /** Uniform in [min, max). */
  between(min: number, max: number): number {
    return min + (max - min) * this.next();
  }

  /** Roughly normal (sum of three uniforms), mean 0, standard deviation `sd`. */
  jitter(sd: number): number {
    return (this.next() + this.next() + this.next() - 1.5) * 2 * sd;
  }

  int(min: number, max: number): number {
    return Math.floor(this.between(min, max + 1));
  }

  pick<T>(items: readonly T[]): T {
    return items[Math.floor(this.next() * items.length)];
  }
}

/** Rounds to the instrument's resolution, as the instrument would show it. */
export function toResolution(value: number, resolution: number): number {
  const decimals = Math.max(0, Math.ceil(-Math.log10(resolution) - 1e-9));
  return Number((Math.round(value / resolution) * resolution).toFixed(decimals));
}
