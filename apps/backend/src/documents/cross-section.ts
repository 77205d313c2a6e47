import { COLOURS, FONT, type Pdf } from './pdf';

/** The metal a drawing shows: what the readings found, or the label's claim. */
export type DrawnMetal = 'copper' | 'cca' | 'aluminium' | 'unknown';

/**
 * Our own palette for the metals in the drawings (our choice of colours): copper in a
 * copper brown, aluminium in a light blue-grey, copper-clad aluminium as the aluminium core
 * with a copper skin, and a metal the readings could not tell as a pale sand with a dashed
 * outline. Every drawing page carries the legend.
 */
export const METAL_COLOURS = {
  copper: '#B87333',
  aluminium: '#A9B6C2',
  unknown: '#E6DFCC',
} as const;

/**
 * Copper's share of a CCA conductor's cross-section as drawn: 10 % by volume, the common
 * grade (ASTM B566 Class 10A; 15A has 15 %). Only for the picture: no figure rests on it.
 */
const CCA_COPPER_FRACTION = 0.1;

export const METAL_WORDS: Record<DrawnMetal, string> = {
  copper: 'Copper',
  cca: 'Copper-clad aluminium',
  aluminium: 'Aluminium',
  unknown: 'Metal not identified',
};

/**
 * The metal to draw for a claimed material (copper, tinned_copper, cca10, cca15, aluminium) or
 * an identified one (copper, cca, aluminium); 'inconsistent', 'unknown' and null draw as not
 * identified.
 */
export function drawnMetal(material: string | null | undefined): DrawnMetal {
  if (material === 'copper' || material === 'tinned_copper') return 'copper';
  if (material === 'aluminium') return 'aluminium';
  if (material?.startsWith('cca')) return 'cca';
  return 'unknown';
}

export interface CrossSection {
  title: string;
  labelText: string;
  /** The metal the label claims. */
  claimedMetal: DrawnMetal;
  nominalAreaMm2: number;
  measuredAreaMm2: number | null;
  /** "21.31 ± 0.22 mm²", at GUM 7.2.6 precision. */
  measuredText: string | null;
  /** The one "measures as" of that reading (issue 13). */
  measuresAs: string | null;
  /** The metal that reading found. */
  foundMetal: DrawnMetal;
  /** "39.7 % of the 4 AWG nominal area". */
  ratioText: string | null;
  failing: boolean;
}

/** One conductor disc of `area` to scale, filled with its metal. */
function disc(doc: Pdf, cx: number, cy: number, r: number, metal: DrawnMetal) {
  if (metal === 'cca') {
    doc.circle(cx, cy, r).fill(METAL_COLOURS.copper);
    // The skin at its share of the area, but never thinner than 1.2 pt, so it shows.
    const core = Math.min(r * Math.sqrt(1 - CCA_COPPER_FRACTION), r - 1.2);
    doc.circle(cx, cy, Math.max(0, core)).fill(METAL_COLOURS.aluminium);
  } else {
    doc.circle(cx, cy, r).fill(METAL_COLOURS[metal]);
  }
  doc.circle(cx, cy, r).lineWidth(0.8);
  if (metal === 'unknown') doc.dash(2, { space: 2 });
  doc.stroke(COLOURS.ink).undash();
}

/** The height drawCrossSections takes. */
export const CROSS_SECTION_HEIGHT = 150;

/**
 * Two conductor cross-sections to scale side by side: the area the label promises in the
 * metal it claims, and the area measured in the metal the readings found (circles of equal
 * area; real strands fill less, the areas are what count). `width` is the box's width.
 */
export function drawCrossSections(
  doc: Pdf,
  x: number,
  y: number,
  width: number,
  section: CrossSection,
): number {
  const maxR = 32;
  const biggest = Math.max(section.nominalAreaMm2, section.measuredAreaMm2 ?? 0);
  const radius = (area: number) => Math.max(1.5, maxR * Math.sqrt(area / biggest));
  doc
    .font(FONT.bold)
    .fontSize(8.5)
    .fillColor(COLOURS.ink)
    .text(section.title, x, y, { width, height: 22, ellipsis: true });
  const cy = y + 24 + maxR;
  const colW = width / 2;
  const left = x + colW / 2;
  const right = x + colW + colW / 2;
  disc(doc, left, cy, radius(section.nominalAreaMm2), section.claimedMetal);
  if (section.measuredAreaMm2 === null) {
    doc
      .font(FONT.body)
      .fontSize(8)
      .fillColor(COLOURS.muted)
      .text('no reading', right - maxR, cy - 4, { width: 2 * maxR, align: 'center' });
  } else {
    disc(doc, right, cy, radius(section.measuredAreaMm2), section.foundMetal);
  }
  const caption = (cx: number, lines: string[], bold = false) => {
    let ty = cy + maxR + 4;
    for (const [i, line] of lines.entries()) {
      doc
        .font(bold && i === 0 ? FONT.bold : FONT.body)
        .fontSize(7.5)
        .fillColor(COLOURS.ink)
        .text(line, cx - colW / 2 + 2, ty, {
          width: colW - 4,
          align: 'center',
          height: 10,
          ellipsis: true,
          lineBreak: false,
        });
      ty += 10;
    }
  };
  caption(left, [
    `Label ${section.labelText}`,
    `${section.nominalAreaMm2} mm² nominal`,
    METAL_WORDS[section.claimedMetal].toLowerCase() + ' claimed',
  ]);
  if (section.measuredAreaMm2 !== null) {
    caption(
      right,
      [
        `Measures as ${section.measuresAs ?? '—'}`,
        section.measuredText ?? '',
        `${METAL_WORDS[section.foundMetal].toLowerCase()}${section.foundMetal === 'unknown' ? '' : ' found'}`,
      ],
      true,
    );
  }
  if (section.ratioText) {
    doc
      .font(FONT.bold)
      .fontSize(8)
      .fillColor(section.failing ? COLOURS.rejected : COLOURS.accepted)
      .text(section.ratioText, x, cy + maxR + 36, { width, align: 'center', height: 11 });
  }
  return y + CROSS_SECTION_HEIGHT;
}

/** The legend of the metal colours, in one row; returns the y below it. */
export function drawMetalLegend(doc: Pdf, x: number, y: number, width: number): number {
  const metals: DrawnMetal[] = ['copper', 'cca', 'aluminium', 'unknown'];
  const step = width / metals.length;
  metals.forEach((m, i) => {
    const cx = x + i * step + 6;
    disc(doc, cx, y + 6, 5, m);
    doc
      .font(FONT.body)
      .fontSize(7.5)
      .fillColor(COLOURS.ink)
      .text(METAL_WORDS[m], cx + 9, y + 2, { width: step - 18, height: 10, lineBreak: false });
  });
  return y + 16;
}
