import { DomainError } from '../common/domain-error';
import { ForbiddenException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { createHash, randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { Sample } from '../inspection/entities/sample.entity';
import { Lot } from '../lots/entities/lot.entity';
import { assertEvidenceNotSent } from '../inspection/evidence-freeze';
import { StorageService } from '../storage/storage.service';
import { User } from '../users/entities/user.entity';
import { UploadPhotoDto } from './dto/upload-photo.dto';
import { Photo } from './entities/photo.entity';
import { checkImage } from './image-check';
import type { ImageType } from './image-header';
import { photoView } from './photo-view';
import { clock } from '../common/clock';

const EXTENSIONS: Record<ImageType, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
};
/** Lot statuses before a decision (as ReadingsService.void). */
const OPEN_STATUSES: readonly string[] = ['on_hold', 'inspecting', 'awaiting_decision'];
/** A stored photo's type, by the extension its generated key ends with. */
export const typeOfKey = (key: string): ImageType =>
  (Object.entries(EXTENSIONS).find(([, ext]) => key.endsWith(`.${ext}`))?.[0] ??
    'image/jpeg') as ImageType;

@Injectable()
export class PhotosService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly storage: StorageService,
  ) {}

  /**
   * Checks the image, stores original and thumbnail under generated names, then the row and
   * its audit event in one transaction; if anything fails after a write, the files go too.
   */
  async upload(
    lotId: number,
    file: Express.Multer.File | undefined,
    dto: UploadPhotoDto,
    actor: RequestUser,
  ) {
    if (!file) {
      throw DomainError.invalid([
        { field: 'file', message: 'file is required: attach a JPEG, PNG or WebP photo' },
      ]);
    }
    const lot = await this.em.findOneOrFail(Lot, { id: lotId });
    await assertEvidenceNotSent(this.em, lot, 'no photo can be added to it', 'file');
    if (dto.sampleId !== undefined) {
      const sample = await this.em.findOne(Sample, { id: dto.sampleId, lot });
      if (!sample) {
        throw DomainError.refused(
          `Sample #${dto.sampleId} is not a sample of this lot.`,
          'sampleId',
        );
      }
    }
    const image = await checkImage(file.buffer);
    const name = randomUUID();
    const ext = EXTENSIONS[image.mimeType];
    const originalKey = `photos/${name}.${ext}`;
    const thumbnailKey = image.thumbnail
      ? `photos/${name}-thumb.${EXTENSIONS[image.thumbnail.mimeType]}`
      : originalKey;
    const written: string[] = [];
    try {
      await this.storage.put(originalKey, file.buffer);
      written.push(originalKey);
      if (image.thumbnail) {
        await this.storage.put(thumbnailKey, image.thumbnail.data);
        written.push(thumbnailKey);
      }
      const photo = await this.em.transactional(async (tx) => {
        const p = tx.create(Photo, {
          lot: tx.getReference(Lot, lot.id),
          sample: dto.sampleId === undefined ? null : tx.getReference(Sample, dto.sampleId),
          caption: dto.caption?.trim() || null,
          storageKey: originalKey,
          thumbnailKey,
          mimeType: image.mimeType,
          sizeBytes: file.size,
          sha256: createHash('sha256').update(file.buffer).digest('hex'),
          width: image.width,
          height: image.height,
          uploadedBy: await tx.findOneOrFail(User, { id: actor.id }),
        });
        tx.persist(p);
        await tx.flush();
        this.audit.record(tx, actor, {
          action: 'photo.create',
          entityType: 'photo',
          entityId: p.id,
          lotId: lot.id,
          after: { sampleId: dto.sampleId ?? null, sha256: p.sha256, mimeType: p.mimeType },
        });
        return p;
      });
      return photoView(photo);
    } catch (e) {
      await Promise.all(written.map((k) => this.storage.delete(k).catch(() => undefined)));
      throw e;
    }
  }

  /**
   * Voids a photo with a reason; the row and its files stay (shown struck with the reason).
   * A clerk voids only photos they took, while the lot is undecided; the QA lead and the
   * admin any photo. Audited as photo.void with before and after.
   */
  async void(id: number, reason: string, actor: RequestUser) {
    const photo = await this.em.transactional(async (tx) => {
      const p = await tx.findOne(Photo, { id }, { populate: ['lot', 'uploadedBy', 'voidedBy'] });
      if (!p) throw DomainError.notFound('No such record');
      if (actor.role === 'clerk') {
        if (p.uploadedBy.id !== actor.id) {
          throw new ForbiddenException(
            'A receiving clerk may void only photos they took; ask a QA lead to void this one.',
          );
        }
        if (!OPEN_STATUSES.includes(p.lot.status)) {
          throw DomainError.refused(
            `Lot ${p.lot.poNumber} is already ${p.lot.status.replace(/_/g, ' ')}: after the decision only a QA lead can void its photos.`,
          );
        }
      }
      if (p.voided) {
        throw DomainError.conflict(
          `This photo was already voided on ${p.voidedAt?.toISOString().slice(0, 10)}: ${p.voidReason}`,
        );
      }
      // The supplier's notice and evidence pack show the photo: it stays as they were sent.
      await assertEvidenceNotSent(tx, p.lot, 'this photo cannot be voided');
      const at = clock.now();
      p.voided = true;
      p.voidReason = reason;
      p.voidedBy = await tx.findOneOrFail(User, { id: actor.id });
      p.voidedAt = at;
      await tx.flush();
      this.audit.record(tx, actor, {
        action: 'photo.void',
        entityType: 'photo',
        entityId: p.id,
        lotId: p.lot.id,
        before: { voided: false, sha256: p.sha256, caption: p.caption },
        after: { voided: true, voidReason: reason, sha256: p.sha256, caption: p.caption },
      });
      return p;
    });
    return photoView(photo);
  }

  async open(
    id: number,
    which: 'original' | 'thumbnail',
  ): Promise<{ stream: Readable; mimeType: ImageType; name: string }> {
    const photo = await this.em.findOneOrFail(Photo, { id });
    const key = which === 'original' ? photo.storageKey : photo.thumbnailKey;
    const mimeType = typeOfKey(key);
    return {
      stream: await this.storage.get(key),
      mimeType,
      name: `photo-${photo.id}${which === 'thumbnail' ? '-thumb' : ''}.${EXTENSIONS[mimeType]}`,
    };
  }
}
