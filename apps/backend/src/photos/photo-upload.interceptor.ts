import { MAX_PHOTO_BYTES } from '@gaugeproof/api-types';
import { singleFileInterceptor } from '../storage/single-file.interceptor';

export { MAX_PHOTO_BYTES };

export const PhotoUploadInterceptor = singleFileInterceptor(
  MAX_PHOTO_BYTES,
  'The photo is larger than 15 MB: export it smaller (a phone photo is usually 2–8 MB) and try again.',
);
