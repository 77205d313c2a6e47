/** The three photo formats accepted, recognised by their first bytes (their "magic"). */
export type ImageType = 'image/jpeg' | 'image/png' | 'image/webp';

export interface ImageHeader {
  mimeType: ImageType;
  width: number;
  height: number;
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** JPEG SOI FF D8 FF; PNG's 8-byte signature; WebP "RIFF" … "WEBP" (the formats' own specs). */
export function sniffImageType(b: Buffer): ImageType | null {
  if (b.length >= 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return 'image/jpeg';
  if (b.length >= 8 && b.subarray(0, 8).equals(PNG_SIGNATURE)) return 'image/png';
  if (
    b.length >= 12 &&
    b.toString('latin1', 0, 4) === 'RIFF' &&
    b.toString('latin1', 8, 12) === 'WEBP'
  )
    return 'image/webp';
  return null;
}

/** PNG: the IHDR chunk comes first, width and height big-endian at bytes 16 and 20. */
function pngSize(b: Buffer): [number, number] | null {
  if (b.length < 24 || b.toString('latin1', 12, 16) !== 'IHDR') return null;
  return [b.readUInt32BE(16), b.readUInt32BE(20)];
}

/** JPEG: walk the marker segments to the first start-of-frame (SOF0–SOF15 but C4, C8, CC). */
function jpegSize(b: Buffer): [number, number] | null {
  let i = 2;
  while (i + 4 <= b.length) {
    if (b[i] !== 0xff) return null;
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
    const isSof = marker >= 0xc0 && marker <= 0xcf && ![0xc4, 0xc8, 0xcc].includes(marker);
    if (isSof) {
      if (i + 9 > b.length) return null;
      return [b.readUInt16BE(i + 7), b.readUInt16BE(i + 5)];
    }
    if (length < 2) return null;
    i += 2 + length;
  }
  return null;
}

/** WebP: VP8 (lossy), VP8L (lossless) or VP8X (extended) first chunk (WebP container spec). */
function webpSize(b: Buffer): [number, number] | null {
  if (b.length < 30) return null;
  const chunk = b.toString('latin1', 12, 16);
  if (chunk === 'VP8X') return [1 + b.readUIntLE(24, 3), 1 + b.readUIntLE(27, 3)];
  if (chunk === 'VP8L' && b[20] === 0x2f) {
    const bits = b.readUInt32LE(21);
    return [1 + (bits & 0x3fff), 1 + ((bits >> 14) & 0x3fff)];
  }
  if (chunk === 'VP8 ' && b[23] === 0x9d && b[24] === 0x01 && b[25] === 0x2a) {
    return [b.readUInt16LE(26) & 0x3fff, b.readUInt16LE(28) & 0x3fff];
  }
  return null;
}

/** Type and claimed dimensions from the header alone, before any decoding; null if unreadable. */
export function readImageHeader(b: Buffer): ImageHeader | null {
  const mimeType = sniffImageType(b);
  if (!mimeType) return null;
  const size =
    mimeType === 'image/png' ? pngSize(b) : mimeType === 'image/jpeg' ? jpegSize(b) : webpSize(b);
  if (!size || size[0] < 1 || size[1] < 1) return null;
  return { mimeType, width: size[0], height: size[1] };
}

/** WebP's RIFF header states the file's length: a shorter file was cut off. */
export function webpComplete(b: Buffer): boolean {
  return b.length >= 12 && b.readUInt32LE(4) + 8 <= b.length;
}
