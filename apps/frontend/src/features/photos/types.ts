/** A photo as the server sends it: the contract's shape (libs/api-types). */
export type { Photo } from '@gaugeproof/api-types';

/** A sample the photo can be attached to, labelled for the picker ("Unit 2 · power"). */
export interface PhotoSampleOption {
  id: number;
  label: string;
}
