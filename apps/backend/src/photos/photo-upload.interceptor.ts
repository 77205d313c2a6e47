import { singleFileInterceptor } from '../storage/single-file.interceptor';

/** 15 MB: a phone photo is 2–8 MB (issue 4; common practice, no source). */
export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;

export const PhotoUploadInterceptor = singleFileInterceptor(
  MAX_PHOTO_BYTES,
  'The photo is larger than 15 MB: export it smaller (a phone photo is usually 2–8 MB) and try again.',
);
