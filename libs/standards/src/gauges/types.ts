export const GAUGE_SYSTEMS = ['awg', 'metric'] as const;
export type GaugeSystem = (typeof GAUGE_SYSTEMS)[number];

/** A standard conductor size as a label promises it. */
export interface Gauge {
  system: GaugeSystem;
  /** Canonical label: `4 AWG`, `1/0 AWG`, `25 mm²`. */
  label: string;
  /**
   * AWG gauge number n of the ASTM B258 formula: 4 AWG → 4, 1/0 → 0, 2/0 → −1, 4/0 → −3.
   */
  awg?: number;
  nominalAreaMm2: number;
  nominalAreaCmil?: number;
  nominalDiameterIn?: number;
  nominalDiameterMm?: number;
}
