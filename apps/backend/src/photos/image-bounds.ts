/**
 * Bounds on what decoding a photo may cost, read from its structure before any pixel is
 * decoded. The megapixel guard alone did not see a PNG whose compressed data inflates far
 * beyond its pixels (the PNG decoder inflates an interlaced image without a limit), nor a
 * JPEG whose frame asks for many components or whose scans repeat.
 */

/** Why a photo was refused before decoding; the message is for the person who uploaded it. */
export class ImageBoundError extends Error {
  /** `corrupt`: the structure is broken; `refused`: well formed but past a bound. */
  constructor(
    readonly kind: 'corrupt' | 'refused',
    message: string,
  ) {
    super(message);
  }
}
const broken = (what: string) => new ImageBoundError('corrupt', what);

export interface PngLayout {
  width: number;
  height: number;
  interlaced: boolean;
  /** The exact number of bytes the image data must inflate to (filter bytes included). */
  rawBytes: number;
  /** [start, end) of each IDAT chunk's data, in file order. */
  idat: [number, number][];
}

/** Channels per colour type (PNG spec, 11.2.2 IHDR, Table 11.1). */
const PNG_CHANNELS: Record<number, number> = { 0: 1, 2: 3, 3: 1, 4: 2, 6: 4 };
/** Allowed bit depths per colour type (PNG spec, 11.2.2 IHDR, Table 11.1). */
const PNG_DEPTHS: Record<number, number[]> = {
  0: [1, 2, 4, 8, 16],
  2: [8, 16],
  3: [1, 2, 4, 8],
  4: [8, 16],
  6: [8, 16],
};
/** Adam7 passes: x start, y start, x step, y step (PNG spec, 8.2 Interlace method 1). */
const ADAM7: [number, number, number, number][] = [
  [0, 0, 8, 8],
  [4, 0, 8, 8],
  [0, 4, 4, 8],
  [2, 0, 4, 4],
  [0, 2, 2, 4],
  [1, 0, 2, 2],
  [0, 1, 1, 2],
];

/** Bytes of one pass: a filter byte per row plus the packed samples (PNG spec, 7.2 and 9.1). */
function passBytes(width: number, height: number, bitsPerPixel: number): number {
  if (width === 0 || height === 0) return 0;
  return height * (1 + Math.ceil((width * bitsPerPixel) / 8));
}

/**
 * Walks a PNG's chunks: the header's fields must be a valid combination, and the image data
 * must sit in IDAT chunks inside the file. Returns how many bytes the data may inflate to.
 */
export function pngLayout(b: Buffer): PngLayout {
  let i = 8;
  let header: { width: number; height: number; bpp: number; interlaced: boolean } | null = null;
  const idat: [number, number][] = [];
  let ended = false;
  while (i + 12 <= b.length) {
    const length = b.readUInt32BE(i);
    const type = b.toString('latin1', i + 4, i + 8);
    const start = i + 8;
    const end = start + length;
    if (end + 4 > b.length) throw broken('truncated');
    if (type === 'IHDR') {
      if (length !== 13 || header) throw broken('bad header');
      const depth = b[start + 8];
      const colourType = b[start + 9];
      const [compression, filter, interlace] = [b[start + 10], b[start + 11], b[start + 12]];
      if (!PNG_DEPTHS[colourType]?.includes(depth) || compression !== 0 || filter !== 0) {
        throw broken('bad header');
      }
      if (interlace > 1) throw broken('bad header');
      header = {
        width: b.readUInt32BE(start),
        height: b.readUInt32BE(start + 4),
        bpp: PNG_CHANNELS[colourType] * depth,
        interlaced: interlace === 1,
      };
    } else if (type === 'IDAT') {
      if (!header) throw broken('data before header');
      idat.push([start, end]);
    } else if (type === 'IEND') {
      ended = true;
      break;
    }
    i = end + 4;
  }
  if (!header || !ended || idat.length === 0) throw broken('truncated');
  const { width, height, bpp, interlaced } = header;
  const rawBytes = interlaced
    ? ADAM7.reduce(
        (sum, [x0, y0, dx, dy]) =>
          sum +
          passBytes(
            width > x0 ? Math.ceil((width - x0) / dx) : 0,
            height > y0 ? Math.ceil((height - y0) / dy) : 0,
            bpp,
          ),
        0,
      )
    : passBytes(width, height, bpp);
  return { width, height, interlaced, rawBytes, idat };
}

/**
 * Most scans a progressive JPEG may have. Encoders write about 10 (the usual progressive
 * script has 10 scans; common practice, no source); each scan makes the decoder walk every
 * coefficient again, so thousands of tiny scans are a way to burn CPU.
 */
export const MAX_JPEG_SCANS = 100;
/**
 * Most MiB a JPEG decode may hold, by the estimate below: a 40 MP three-component photo
 * without chroma subsampling needs about 496 MiB; 512 is the JPEG decoder's own default
 * ceiling (jpeg-js `maxMemoryUsageInMB`), which is also passed to it.
 */
export const MAX_JPEG_DECODE_MB = 512;

export interface JpegLayout {
  width: number;
  height: number;
  components: number;
  scans: number;
  /** What the decoder will allocate, estimated from the frame (coefficients + output). */
  decodeBytes: number;
}

/**
 * Reads a JPEG's frame header and counts its scans. A baseline or progressive frame has 1, 3
 * or 4 components (ITU T.81 B.2.2 allows up to 255 for other uses; a photo never needs more
 * than 4) with sampling factors 1 to 4 (T.81 B.2.2).
 */
export function jpegLayout(b: Buffer): JpegLayout {
  let i = 2;
  let frame: { width: number; height: number; factors: [number, number][] } | null = null;
  while (i + 4 <= b.length && !frame) {
    if (b[i] !== 0xff) throw broken('bad marker');
    const marker = b[i + 1];
    if (marker === 0xff) {
      i++;
      continue;
    }
    if (marker === 0xd8 || marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7)) {
      i += 2;
      continue;
    }
    const length = b.readUInt16BE(i + 2);
    if (length < 2) throw broken('bad marker');
    const isSof = marker >= 0xc0 && marker <= 0xcf && ![0xc4, 0xc8, 0xcc].includes(marker);
    if (isSof) {
      if (i + 10 > b.length) throw broken('truncated');
      const height = b.readUInt16BE(i + 5);
      const width = b.readUInt16BE(i + 7);
      const n = b[i + 9];
      if (![1, 3, 4].includes(n)) {
        throw new ImageBoundError(
          'refused',
          `its frame has ${n} colour components; a photo has 1, 3 or 4 (ITU T.81 B.2.2)`,
        );
      }
      if (i + 10 + 3 * n > b.length) throw broken('truncated');
      const factors: [number, number][] = [];
      for (let c = 0; c < n; c++) {
        const hv = b[i + 11 + 3 * c];
        const h = hv >> 4;
        const v = hv & 15;
        if (h < 1 || h > 4 || v < 1 || v > 4) {
          throw new ImageBoundError('refused', 'a component has a sampling factor outside 1 to 4');
        }
        factors.push([h, v]);
      }
      frame = { width, height, factors };
    }
    i += 2 + length;
  }
  if (!frame) throw broken('truncated');
  // In entropy-coded data a 0xFF byte is always followed by 0x00 or a restart marker, so
  // every FF DA pair in the file is a start-of-scan marker (T.81 B.1.1.5).
  let scans = 0;
  for (let at = b.indexOf(0xff, i); at !== -1 && at + 1 < b.length; at = b.indexOf(0xff, at + 1)) {
    if (b[at + 1] === 0xda) scans++;
  }
  if (scans > MAX_JPEG_SCANS) {
    throw new ImageBoundError(
      'refused',
      `it has ${scans} scans; at most ${MAX_JPEG_SCANS} are accepted`,
    );
  }
  const hMax = Math.max(...frame.factors.map(([h]) => h));
  const vMax = Math.max(...frame.factors.map(([, v]) => v));
  const mcuW = Math.ceil(frame.width / (8 * hMax));
  const mcuH = Math.ceil(frame.height / (8 * vMax));
  // Per component: 64 coefficients of 2 bytes per 8 × 8 block over whole MCUs, plus one
  // byte per output sample; then the RGBA output (jpeg-js decoder's allocations).
  const decodeBytes =
    frame.factors.reduce((sum, [h, v]) => {
      const blocks = mcuW * h * mcuH * v;
      return sum + blocks * 64 * 2 + blocks * 64;
    }, 0) +
    frame.width * frame.height * 4;
  if (decodeBytes > MAX_JPEG_DECODE_MB * 1024 * 1024) {
    throw new ImageBoundError(
      'refused',
      `decoding it would take about ${Math.round(decodeBytes / 1024 / 1024)} MB; at most ${MAX_JPEG_DECODE_MB} MB are allowed`,
    );
  }
  return {
    width: frame.width,
    height: frame.height,
    components: frame.factors.length,
    scans,
    decodeBytes,
  };
}
