export interface CircleGeometry {
  areaMm2: number;
  /** Radius of the real conductor, mm: r = √(A/π) (a solid circle of the same copper area). */
  radiusMm: number;
  /** Radius on the drawing, px. */
  radiusPx: number;
}

export interface CrossSectionGeometry {
  labelled: CircleGeometry;
  measured: CircleGeometry;
  /** Drawing scale, px per mm, the same for both circles: areas stay in proportion. */
  pxPerMm: number;
  /** A round scale-bar length (1, 2 or 5 × 10ⁿ mm) and its width on the drawing. */
  scaleBarMm: number;
  scaleBarPx: number;
}

function circle(areaMm2: number, pxPerMm: number): CircleGeometry {
  const radiusMm = Math.sqrt(areaMm2 / Math.PI);
  return { areaMm2, radiusMm, radiusPx: radiusMm * pxPerMm };
}

function roundScaleBar(maxMm: number): number {
  const power = 10 ** Math.floor(Math.log10(maxMm));
  return [5, 2, 1].map((m) => m * power).find((candidate) => candidate <= maxMm) ?? power;
}

/**
 * Both copper cross-sections at one scale, the larger filling `maxRadiusPx`: circle areas are
 * in the same proportion as the conductor areas (radius ∝ √area).
 */
export function crossSectionGeometry(
  nominalAreaMm2: number,
  measuredAreaMm2: number,
  maxRadiusPx: number,
): CrossSectionGeometry {
  if (!(nominalAreaMm2 > 0) || !(measuredAreaMm2 > 0) || !(maxRadiusPx > 0)) {
    throw new RangeError('Areas and the drawing size must be positive numbers.');
  }
  const largestRadiusMm = Math.sqrt(Math.max(nominalAreaMm2, measuredAreaMm2) / Math.PI);
  const pxPerMm = maxRadiusPx / largestRadiusMm;
  const scaleBarMm = roundScaleBar(largestRadiusMm);
  return {
    labelled: circle(nominalAreaMm2, pxPerMm),
    measured: circle(measuredAreaMm2, pxPerMm),
    pxPerMm,
    scaleBarMm,
    scaleBarPx: scaleBarMm * pxPerMm,
  };
}
