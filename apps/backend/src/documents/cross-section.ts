import { COLOURS, FONT, type Pdf } from './pdf';

export interface CrossSection {
  title: string;
  labelText: string;
  nominalAreaMm2: number;
  measuredAreaMm2: number | null;
  measuresAs: string | null;
  /** The product's area acceptance (default 0.98, ASTM B496). */
  minAreaRatio: number;
}

/**
 * Two conductor cross-sections to scale side by side: the area the label promises and the
 * area measured (circles of equal area; real strands fill less, the areas are what count).
 */
export function drawCrossSections(doc: Pdf, x: number, y: number, section: CrossSection) {
  const maxR = 34;
  const biggest = Math.max(section.nominalAreaMm2, section.measuredAreaMm2 ?? 0);
  const radius = (area: number) => maxR * Math.sqrt(area / biggest);
  doc.font(FONT.bold).fontSize(9).fillColor(COLOURS.ink).text(section.title, x, y);
  const cy = y + 16 + maxR;
  const circles: [number, number | null, string, string][] = [
    [x + maxR, section.nominalAreaMm2, COLOURS.copper, `Label ${section.labelText}`],
    [
      x + 3 * maxR + 40,
      section.measuredAreaMm2,
      COLOURS.measured,
      `Measured ${section.measuresAs ?? ''}`,
    ],
  ];
  for (const [cx, area, colour, caption] of circles) {
    if (area === null) {
      doc
        .font(FONT.body)
        .fontSize(8)
        .fillColor(COLOURS.muted)
        .text('no reading', cx - maxR, cy - 4, { width: 2 * maxR, align: 'center' });
    } else {
      doc.circle(cx, cy, radius(area)).fillOpacity(0.85).fill(colour).fillOpacity(1);
      doc.circle(cx, cy, radius(area)).lineWidth(0.8).stroke(COLOURS.ink);
    }
    doc.font(FONT.body).fontSize(8).fillColor(COLOURS.ink);
    doc.text(caption, cx - maxR - 10, cy + maxR + 4, { width: 2 * maxR + 20, align: 'center' });
    doc.text(area === null ? '' : `${area.toFixed(2)} mm²`, cx - maxR - 10, cy + maxR + 14, {
      width: 2 * maxR + 20,
      align: 'center',
    });
  }
  const ratio =
    section.measuredAreaMm2 !== null ? section.measuredAreaMm2 / section.nominalAreaMm2 : null;
  if (ratio !== null) {
    doc
      .font(FONT.bold)
      .fontSize(9)
      .fillColor(ratio < section.minAreaRatio ? COLOURS.rejected : COLOURS.accepted);
    doc.text(`${Math.round(ratio * 100)} % of the labelled copper area`, x, cy + maxR + 28);
  }
  return cy + maxR + 44;
}
