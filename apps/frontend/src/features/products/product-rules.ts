import { parseGauge, StandardsInputError, type Gauge } from '@gaugeproof/standards';
import type { ConductorPurpose } from '@/features/products/types';

export type GaugePreview = { ok: true; gauge: Gauge } | { ok: false; message: string };

/** The canonical size a typed label stands for, or why it is not one (parseGauge). */
export function previewGauge(label: string): GaugePreview {
  try {
    return { ok: true, gauge: parseGauge(label) };
  } catch (error) {
    if (error instanceof StandardsInputError) return { ok: false, message: error.message };
    throw error;
  }
}

interface ConductorLabel {
  purpose: ConductorPurpose;
  gauge: string;
}

/**
 * Warnings for a product as typed, worded as the server words them. Power and ground run in
 * one loop and carry the same current, so a ground sized unlike its power is a kit to
 * question (common practice, no source; REFERENCE §7). Checked for any product holding both,
 * as the server does; in practice that is a kit.
 */
export function kitWarnings(conductors: readonly ConductorLabel[]): string[] {
  const sized = conductors.flatMap((c) => {
    const preview = previewGauge(c.gauge);
    return preview.ok ? [{ purpose: c.purpose, gauge: preview.gauge }] : [];
  });
  const power = sized.find((c) => c.purpose === 'power');
  if (!power) return [];
  const warnings = sized
    .filter((c) => c.purpose === 'ground' && c.gauge.nominalAreaMm2 !== power.gauge.nominalAreaMm2)
    .map(
      (g) =>
        `Power is ${power.gauge.label} but ground is ${g.gauge.label}: ground should be sized like power (common practice).`,
    );
  return [...new Set(warnings)];
}

/** True when a warning is about a ground smaller than its power. */
export const groundIsSmaller = (conductors: readonly ConductorLabel[]): boolean => {
  const area = (purpose: ConductorPurpose) => {
    const c = conductors.find((x) => x.purpose === purpose);
    const preview = c ? previewGauge(c.gauge) : null;
    return preview?.ok ? preview.gauge.nominalAreaMm2 : null;
  };
  const power = area('power');
  const ground = area('ground');
  return power !== null && ground !== null && ground < power;
};
