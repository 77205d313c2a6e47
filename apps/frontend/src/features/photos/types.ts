export interface Photo {
  id: number;
  url: string;
  thumbnailUrl: string;
  caption: string | null;
  sampleId: number | null;
  sha256: string;
  mimeType: string;
  width: number;
  height: number;
  sizeBytes: number;
  uploadedBy: { id: number; name: string };
  createdAt: string;
}

/** A sample the photo can be attached to, labelled for the picker ("Unit 2 · power"). */
export interface PhotoSampleOption {
  id: number;
  label: string;
}
