import type { Photo } from './entities/photo.entity';

/** Photo as docs/api-conventions.md describes it; the bytes are served by the photo routes. */
export function photoView(p: Photo) {
  return {
    id: p.id,
    url: `/api/photos/${p.id}/original`,
    thumbnailUrl: `/api/photos/${p.id}/thumbnail`,
    caption: p.caption,
    sampleId: p.sample?.id ?? null,
    sha256: p.sha256,
    mimeType: p.mimeType,
    width: p.width,
    height: p.height,
    sizeBytes: p.sizeBytes,
    uploadedBy: p.uploadedBy ? { id: p.uploadedBy.id, name: p.uploadedBy.name } : null,
    createdAt: p.createdAt,
    voided: p.voided,
    voidReason: p.voidReason,
    voidedBy: p.voidedBy ? { id: p.voidedBy.id, name: p.voidedBy.name } : null,
    voidedAt: p.voidedAt,
  };
}
export type PhotoView = ReturnType<typeof photoView>;
