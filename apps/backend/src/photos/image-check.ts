import { DomainError } from '../common/domain-error';
import { ServiceUnavailableException, UnsupportedMediaTypeException } from '@nestjs/common';
import {
  DecodePoolBusyError,
  DecodeTimeoutError,
  decodePool,
  type DecodeJob,
  type DecodeResult,
} from './decode-pool';
import { ImageBoundError, jpegLayout, MAX_JPEG_DECODE_MB, pngLayout } from './image-bounds';
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
  DomainError.refused(
    'The image could not be read: the file is truncated or corrupt. Export it again and retry.',
  );

/**
 * Judges an upload by its bytes: the type from its magic, the size from its header (refused
 * above 40 MP before any decoding), the bounds of its structure (a PNG's data may inflate to
 * exactly what its pixels need, a JPEG's frame and scans are limited), then a full decode and
 * a thumbnail with jimp in a decode thread (decode-pool.ts).
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
    throw DomainError.refused(
      `The image claims ${header.width} × ${header.height} pixels (${megapixels.toFixed(0)} megapixels); at most ${MAX_MEGAPIXELS} megapixels are accepted.`,
    );
  }
  if (header.mimeType === 'image/webp') {
    if (!webpComplete(data)) throw corrupt();
    return { ...header, thumbnail: null };
  }
  // Bounds from the file's structure, before any decoding.
  let png: DecodeJob['png'];
  try {
    if (header.mimeType === 'image/png') {
      const layout = pngLayout(data);
      png = { rawBytes: layout.rawBytes, idat: layout.idat };
    } else {
      jpegLayout(data);
    }
  } catch (e) {
    if (!(e instanceof ImageBoundError)) throw e;
    if (e.kind === 'refused') {
      throw DomainError.refused(`The image was refused before decoding: ${e.message}.`);
    }
    throw corrupt();
  }
  let result: DecodeResult;
  try {
    result = await decodePool().run({
      data,
      mimeType: header.mimeType,
      png,
      thumbnailPx: THUMBNAIL_PX,
      jpegMaxMemoryMb: MAX_JPEG_DECODE_MB,
    });
  } catch (e) {
    if (e instanceof DecodePoolBusyError) {
      throw new ServiceUnavailableException(
        'Too many photos are being processed right now; nothing was saved. Try again in a few seconds.',
      );
    }
    if (e instanceof DecodeTimeoutError) {
      throw DomainError.refused(
        'The image took too long to decode and was refused; nothing was saved. Export it again at a smaller size.',
      );
    }
    throw e;
  }
  if (!result.ok) {
    if (result.reason === 'inflates') {
      throw DomainError.refused(
        `The image's compressed data inflates to more than its ${header.width} × ${header.height} pixels need; it was refused before decoding (a damaged file or a decompression bomb).`,
      );
    }
    throw corrupt();
  }
  if (result.width !== header.width || result.height !== header.height) throw corrupt();
  return {
    ...header,
    thumbnail: { data: Buffer.from(result.thumbnail), mimeType: header.mimeType },
  };
}
