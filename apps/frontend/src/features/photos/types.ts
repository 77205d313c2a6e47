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
  /** Never deleted: a void photo stays, shown struck with its reason. */
  voided: boolean;
  voidReason: string | null;
  voidedBy: { id: number; name: string } | null;
  voidedAt: string | null;
}

/** A sample the photo can be attached to, labelled for the picker ("Unit 2 · power"). */
export interface PhotoSampleOption {
  id: number;
  label: string;
}
