import { Jimp } from 'jimp';
import type { Sample } from '../inspection/entities/sample.entity';
import type { Lot } from '../lots/entities/lot.entity';
import type { ScenarioContext } from './seed-scenario-context';

export type CrossSection = 'copper' | 'cca' | 'undersized';

const W = 640;
const H = 480;
type Rgb = [number, number, number];
const BACKGROUND: Rgb = [26, 29, 33];
const JACKET: Rgb = [128, 131, 136];
const COPPER: Rgb = [184, 115, 51];
const ALUMINIUM: Rgb = [196, 199, 204];
const GAP: Rgb = [44, 36, 30];

/** Jacket and conductor radii (px); an undersized conductor sits in a thick jacket. */
const SHAPES: Record<CrossSection, { jacket: number; metal: number; caption: string }> = {
  copper: { jacket: 200, metal: 160, caption: 'Cut end: stranded copper, bright through' },
  cca: {
    jacket: 200,
    metal: 160,
    caption: 'Cut end: silver-grey cores under a thin copper skin (copper-clad aluminium?)',
  },
  undersized: {
    jacket: 200,
    metal: 120,
    caption: 'Cut end of the power lead: thick jacket, small bundle of strands',
  },
};

const shade = (c: Rgb, f: number): Rgb => [c[0] * f, c[1] * f, c[2] * f];

/** The colour of one strand's pixel: CCA strands are aluminium with a thin copper ring. */
function strandColour(kind: CrossSection, d: number, radius: number): Rgb {
  const light = 1.15 - 0.45 * (d / radius);
  if (kind === 'cca' && d < radius * 0.8) return shade(ALUMINIUM, light);
  return shade(COPPER, light);
}

/**
 * A drawn cross-section of a cut cable end, as a clerk's photo would show it: a dark bench,
 * the grey jacket ring, and the conductor as a bundle of hexagonally packed strands.
 */
export async function drawCrossSection(kind: CrossSection, variant = 0): Promise<Buffer> {
  const { jacket, metal } = SHAPES[kind];
  const image = new Jimp({ width: W, height: H, color: 0x000000ff });
  const data = image.bitmap.data;
  // Each photo framed a little differently, as no two cut ends sit alike under the camera.
  const cx = W / 2 + ((variant * 37) % 41) - 20;
  const cy = H / 2 + ((variant * 23) % 31) - 15;
  const pitch = kind === 'undersized' ? 21 : 19;
  const strand = pitch / 2 - 1;
  const rowH = (pitch * Math.sqrt(3)) / 2;
  for (let y = 0; y < H; y++) {
    for (let x = 0; x < W; x++) {
      const r = Math.hypot(x - cx, y - cy);
      let c: Rgb = shade(BACKGROUND, 1 + 0.05 * Math.sin(x / 37 + y / 53));
      if (r <= jacket) c = shade(JACKET, 1.1 - 0.25 * (r / jacket));
      if (r <= metal + 2) {
        const row = Math.round((y - cy) / rowH);
        const offset = row % 2 === 0 ? 0 : pitch / 2;
        const col = Math.round((x - cx - offset) / pitch);
        const sx = cx + offset + col * pitch;
        const sy = cy + row * rowH;
        const d = Math.hypot(x - sx, y - sy);
        const inside = Math.hypot(sx - cx, sy - cy) <= metal - strand;
        c = inside && d <= strand ? strandColour(kind, d, strand) : GAP;
      }
      const i = (y * W + x) * 4;
      data[i] = Math.min(255, c[0]);
      data[i + 1] = Math.min(255, c[1]);
      data[i + 2] = Math.min(255, c[2]);
      data[i + 3] = 255;
    }
  }
  return image.getBuffer('image/png');
}

/** Uploads a drawn photo of the sample through the real photo service (checks, thumbnail). */
export async function photograph(
  ctx: ScenarioContext,
  lot: Lot,
  sample: Sample | null,
  kind: CrossSection,
): Promise<void> {
  const buffer = await drawCrossSection(kind, lot.id);
  const file = { buffer, size: buffer.length, mimetype: 'image/png' } as Express.Multer.File;
  ctx.time.advance(3);
  await ctx.step(() =>
    ctx.photos.upload(
      lot.id,
      file,
      { sampleId: sample?.id, caption: SHAPES[kind].caption },
      ctx.users.clerk,
    ),
  );
}
