import { UnprocessableEntityException, UnsupportedMediaTypeException } from '@nestjs/common';
import { readImageHeader, sniffImageType, webpComplete, type ImageType } from './image-header';

/** 40 megapixels: above any phone camera; a guard against decompression bombs (no source). */
export const MAX_MEGAPIXELS = 40;
/** Thumbnails fit in 320 × 320 px (issue 4). */
export const THUMBNAIL_PX = 320;

export interface CheckedImage {
  mimeType: ImageType;
  width: number;
  height: number;
  /** Null for WebP: the image library here has no WebP codec, so the original is served. */
  thumbnail: { data: Buffer; mimeType: ImageType } | null;
}

const corrupt = () =>
  new UnprocessableEntityException(
    'The image could not be read: the file is truncated or corrupt. Export it again and retry.',
  );

/**
 * Judges an upload by its bytes: the type from its magic, the size from its header (refused
 * above 40 MP before any decoding), then a full decode and a thumbnail with jimp.
 */
export async function checkImage(data: Buffer): Promise<CheckedImage> {
  if (!sniffImageType(data)) {
    throw new UnsupportedMediaTypeException(
      'Only JPEG, PNG or WebP photos are accepted, and this file is none of them (judged by its content, not its name).',
    );
  }
  const header = readImageHeader(data);
  if (!header) throw corrupt();
  const megapixels = (header.width * header.height) / 1e6;
  if (megapixels > MAX_MEGAPIXELS) {
    throw new UnprocessableEntityException(
      `The image claims ${header.width} × ${header.height} pixels (${megapixels.toFixed(0)} megapixels); at most ${MAX_MEGAPIXELS} megapixels are accepted.`,
    );
  }
  if (header.mimeType === 'image/webp') {
    if (!webpComplete(data)) throw corrupt();
    return { ...header, thumbnail: null };
  }
  // jimp is loaded on the first photo, not at start (about 14 MB of resident memory).
  const { Jimp } = await import('jimp');
  let image: Awaited<ReturnType<typeof Jimp.fromBuffer>>;
  try {
    image = await Jimp.fromBuffer(data);
  } catch {
    throw corrupt();
  }
  if (image.bitmap.width !== header.width || image.bitmap.height !== header.height) throw corrupt();
  if (Math.max(header.width, header.height) > THUMBNAIL_PX) {
    image.scaleToFit({ w: THUMBNAIL_PX, h: THUMBNAIL_PX });
  }
  const thumb =
    header.mimeType === 'image/jpeg'
      ? await image.getBuffer('image/jpeg', { quality: 80 })
      : await image.getBuffer('image/png');
  return { ...header, thumbnail: { data: thumb, mimeType: header.mimeType } };
}
