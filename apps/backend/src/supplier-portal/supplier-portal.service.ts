import { DomainError } from '../common/domain-error';
import { MAX_ATTACHMENT_BYTES } from '@gaugeproof/api-types';
import { randomUUID } from 'node:crypto';
import { GoneException, Inject, Injectable, UnsupportedMediaTypeException } from '@nestjs/common';
import { EntityManager, OptimisticLockError } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import { isCalendarDate, isoDate } from '../common/calendar';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { CorrectiveAction } from '../corrective-actions/entities/corrective-action.entity';
import type { Lot } from '../lots/entities/lot.entity';
import { Photo } from '../photos/entities/photo.entity';
import { sniffImageType } from '../photos/image-header';
import { typeOfKey } from '../photos/photos.service';
import { VendorReturn } from '../returns/entities/vendor-return.entity';
import { ReturnDocuments } from '../returns/return-documents';
import { StorageService } from '../storage/storage.service';
import { NoticesService } from '../notices/notices.service';
import { SupplierResponseDto } from './dto/portal.dto';
import { ReturnLink } from '../returns/entities/return-link.entity';
import { ScarAttachment } from '../corrective-actions/entities/scar-attachment.entity';
import { SupplierLink } from '../corrective-actions/entities/supplier-link.entity';
import { sha256, signedByUs } from '../common/portal-token';
import { clock } from '../common/clock';

type Resolved = { kind: 'scar'; link: SupplierLink } | { kind: 'return'; link: ReturnLink };

export { MAX_ATTACHMENT_BYTES };
/** At most this many files on one request. */
const MAX_ATTACHMENTS = 20;
const NOT_VALID =
  'This link is not valid. Check that the whole address from the e-mail was copied, or ask your customer for a new link.';

/** A link that is not ours, unknown or gone: the portal's throttle counts these per address. */
export class UnknownLinkError extends DomainError {
  constructor() {
    super('not_found', [{ field: null, message: NOT_VALID }]);
  }
}

/** PDF by its "%PDF-" header (ISO 32000-1, 7.5.2), images by their own magic bytes. */
function sniffAttachment(b: Buffer): string | null {
  if (b.length >= 5 && b.toString('latin1', 0, 5) === '%PDF-') return 'application/pdf';
  return sniffImageType(b);
}

/** The deliveries a page names, oldest first, as the supplier knows them: no internal ids. */
function deliveriesOf(lots: readonly Lot[]) {
  return [...lots]
    .sort((a, b) => a.id - b.id)
    .map((l) => ({
      poNumber: l.poNumber,
      packingSlip: l.packingSlip,
      supplierLotCode: l.supplierLotCode,
      receivedOn: isoDate(l.receivedAt),
      quantity: l.quantity,
      unit: l.unit,
    }));
}

/** A file name safe to show and to put in a header: letters, digits, dot, dash, space. */
function cleanName(name: string | undefined, type: string): string {
  const base = (name ?? '')
    .normalize('NFKC')
    .replace(/[^\p{L}\p{N}. _-]+/gu, '_')
    .slice(-120)
    .trim();
  const ext = type === 'application/pdf' ? 'pdf' : type.split('/')[1];
  return base || `attachment.${ext}`;
}

/**
 * The supplier's side of a corrective-action request or a return notice, reached by the
 * signed link e-mailed to the supplier (`<random>.<HMAC>`, only its SHA-256 stored; 30
 * days; revocable; sent by `ScarLinks` and `ReturnMailService`): the public page's data,
 * the answer and the attachments. The page shows that one request and nothing else: no
 * internal ids, notes, other lots or other suppliers.
 */
@Injectable()
export class SupplierPortalService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly storage: StorageService,
    private readonly documents: ReturnDocuments,
    private readonly notices: NoticesService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /**
   * The link behind a token, of either kind: 404 for anything not ours, 410 once expired
   * or revoked. The signature is checked first, so a guessed token costs no look-up.
   */
  private async resolveAny(em: EntityManager, token: string): Promise<Resolved> {
    if (!signedByUs(this.config.jwtSecret, token)) throw new UnknownLinkError();
    const hash = sha256(token);
    const scar = await em.findOne(
      SupplierLink,
      { tokenHash: hash },
      { populate: ['correctiveAction', 'correctiveAction.supplier', 'correctiveAction.lots'] },
    );
    const found: Resolved | null = scar
      ? { kind: 'scar', link: scar }
      : await em
          .findOne(
            ReturnLink,
            { tokenHash: hash },
            { populate: ['vendorReturn', 'vendorReturn.supplier', 'vendorReturn.lots'] },
          )
          .then((link) => (link ? { kind: 'return' as const, link } : null));
    if (!found) throw new UnknownLinkError();
    const { link } = found;
    if (link.revokedAt) {
      throw new GoneException(
        'This link was withdrawn by your customer. Use the newest link you received, or ask for a new one.',
      );
    }
    if (link.expiresAt.getTime() < clock.nowMs()) {
      throw new GoneException(
        `This link expired on ${isoDate(link.expiresAt)}. Ask your customer for a new one.`,
      );
    }
    return found;
  }

  /** A corrective-action request's link; a return notice's link takes no answer. */
  private async resolve(em: EntityManager, token: string): Promise<SupplierLink> {
    const found = await this.resolveAny(em, token);
    if (found.kind !== 'scar') {
      throw DomainError.refused(
        'This page shows a return notice; it takes no answer or files. Reply to the e-mail it came with.',
      );
    }
    return found.link;
  }

  /** What the supplier's page shows: this one request, nothing else. */
  async view(token: string) {
    const em = this.em.fork();
    const found = await this.resolveAny(em, token);
    found.link.lastOpenedAt = clock.now();
    await em.flush();
    return found.kind === 'scar' ? this.viewOf(em, found.link) : this.returnViewOf(em, found.link);
  }

  /** The photos a return notice shows: those of its own lots, oldest first, none voided. */
  private returnPhotos(em: EntityManager, ret: VendorReturn) {
    const lotIds = ret.lots.getItems().map((l) => l.id);
    return em.find(
      Photo,
      { lot: { $in: lotIds }, voided: false },
      { orderBy: { lot: 'asc', id: 'asc' }, populate: ['lot'] },
    );
  }

  /** What a return notice's page shows, field by field: that return, nothing else. */
  private async returnViewOf(em: EntityManager, link: ReturnLink) {
    const ret = link.vendorReturn;
    const photos = await this.returnPhotos(em, ret);
    return {
      kind: 'return' as const,
      number: ret.number,
      status: ret.status,
      supplier: { name: ret.supplier.name },
      note: ret.supplierNote,
      rmaNumber: ret.rmaNumber,
      chargeback: { amount: ret.chargebackTotal, currency: ret.currency },
      emailedOn: ret.emailedAt ? isoDate(ret.emailedAt) : null,
      lots: deliveriesOf(ret.lots.getItems()),
      photos: photos.map((p, i) => ({
        n: i + 1,
        poNumber: p.lot.poNumber,
        width: p.width,
        height: p.height,
        takenOn: isoDate(p.createdAt),
      })),
      evidencePack: { number: ret.number },
      linkExpiresAt: link.expiresAt,
    };
  }

  /** Photo n (1-based, as the page lists them) of a return notice's lots. */
  async photo(token: string, n: number, which: 'original' | 'thumbnail') {
    const em = this.em.fork();
    const found = await this.resolveAny(em, token);
    if (found.kind !== 'return') throw DomainError.notFound('This page has no photos');
    const photo = (await this.returnPhotos(em, found.link.vendorReturn))[n - 1];
    if (!photo) throw DomainError.notFound(`There is no photo ${n} on this page`);
    const key = which === 'original' ? photo.storageKey : photo.thumbnailKey;
    const type = typeOfKey(key);
    return { stream: await this.storage.get(key), type, name: `photo-${n}.${type.split('/')[1]}` };
  }

  private async viewOf(em: EntityManager, link: SupplierLink) {
    const car = link.correctiveAction;
    const attachments = await em.find(
      ScarAttachment,
      { correctiveAction: car.id },
      { orderBy: { id: 'asc' } },
    );
    const evidence = await this.evidenceReturn(em, car);
    return {
      kind: 'corrective_action' as const,
      number: car.number,
      status: car.status,
      supplier: { name: car.supplier.name },
      problem: car.problem,
      dueOn: car.dueOn,
      lots: deliveriesOf(car.lots.getItems()),
      reopenComment: car.status === 'reopened' ? car.reopenComment : null,
      answer: {
        containment: car.containment,
        rootCause: car.rootCause,
        correctiveAction: car.correctiveAction,
        promisedOn: car.promisedOn,
        respondedAt: car.respondedAt,
      },
      canAnswer: car.status === 'open' || car.status === 'reopened',
      attachments: attachments.map((a) => ({
        filename: a.filename,
        contentType: a.contentType,
        sizeBytes: a.sizeBytes,
        addedAt: a.createdAt,
      })),
      evidencePack: evidence ? { number: evidence.number } : null,
      linkExpiresAt: link.expiresAt,
    };
  }

  /** The latest return (not cancelled) of the request's lots, whose evidence pack the page offers. */
  private async evidenceReturn(em: EntityManager, car: CorrectiveAction) {
    const lotIds = car.lots.getItems().map((l) => l.id);
    if (!lotIds.length) return null;
    return em.findOne(
      VendorReturn,
      {
        supplier: car.supplier.id,
        lots: { id: { $in: lotIds } },
        status: { $nin: ['cancelled', 'draft'] },
      },
      { orderBy: { id: 'desc' } },
    );
  }

  async evidencePdf(token: string): Promise<{ pdf: Buffer; number: string }> {
    const em = this.em.fork();
    const found = await this.resolveAny(em, token);
    const ret =
      found.kind === 'return'
        ? found.link.vendorReturn
        : await this.evidenceReturn(em, found.link.correctiveAction);
    if (!ret) throw DomainError.notFound('There is no evidence pack for this request yet');
    await em.populate(ret, ['supplier', 'lots', 'createdBy']);
    return { pdf: await this.documents.pdf(ret), number: ret.number };
  }

  async respond(token: string, dto: SupplierResponseDto) {
    if (!isCalendarDate(dto.promisedOn)) {
      throw DomainError.refused('promisedOn must be a real date YYYY-MM-DD', 'promisedOn');
    }
    try {
      const view = await this.em.fork().transactional(async (tx) => {
        const link = await this.resolve(tx, token);
        const car = link.correctiveAction;
        if (car.status !== 'open' && car.status !== 'reopened') {
          throw DomainError.refused(
            `${car.number} is already answered (${car.status}); your customer will reopen it if they need more`,
          );
        }
        const before = { status: car.status, version: car.version };
        car.containment = dto.containment.trim();
        car.rootCause = dto.rootCause.trim();
        car.correctiveAction = dto.correctiveAction.trim();
        car.promisedOn = dto.promisedOn;
        car.status = 'responded';
        car.respondedAt = clock.now();
        car.respondedBy = `supplier link (${link.sentTo})`;
        car.updatedAt = clock.now();
        await tx.flush();
        const lotIds = car.lots.getItems().map((l) => l.id);
        for (const lotId of lotIds.length ? lotIds : [null]) {
          this.audit.record(tx, null, {
            action: 'corrective_action.respond',
            entityType: 'corrective_action',
            entityId: car.id,
            lotId,
            before,
            after: {
              number: car.number,
              status: car.status,
              via: 'supplier link',
              sentTo: link.sentTo,
              linkId: link.id,
              promisedOn: car.promisedOn,
            },
          });
        }
        await this.notices.raise(tx, {
          kind: 'scar_answered',
          key: `scar_answered:${car.id}:${car.version}`,
          subject: `${car.supplier.name} answered ${car.number}`,
          body: [
            `${car.supplier.name} answered corrective action ${car.number} through its link (${link.sentTo}).`,
            `Containment: ${car.containment}`,
            `Root cause: ${car.rootCause}`,
            `Corrective action: ${car.correctiveAction}`,
            `In place by: ${car.promisedOn}`,
            `Review it, ask for more or verify it here: ${this.notices.link(`/corrective-actions/${car.id}`)}`,
          ].join('\n\n'),
        });
        await tx.flush();
        return this.viewOf(tx, link);
      });
      this.notices.deliver();
      return view;
    } catch (e) {
      if (e instanceof OptimisticLockError) {
        throw DomainError.refused(
          'Your customer changed this request while you answered; reload the page and answer again',
        );
      }
      throw e;
    }
  }

  async attach(token: string, file: Express.Multer.File | undefined) {
    if (!file) throw DomainError.refused('Choose a file to send (PDF or image)', 'file');
    const type = sniffAttachment(file.buffer);
    if (!type) {
      throw new UnsupportedMediaTypeException(
        'Send a PDF or an image (JPEG, PNG or WebP); this file is neither, whatever its name says',
      );
    }
    const em = this.em.fork();
    const link = await this.resolve(em, token);
    const car = link.correctiveAction;
    if (car.status === 'verified' || car.status === 'closed') {
      throw DomainError.refused(`${car.number} is ${car.status}; it takes no more files`);
    }
    if ((await em.count(ScarAttachment, { correctiveAction: car.id })) >= MAX_ATTACHMENTS) {
      throw DomainError.refused(
        `${car.number} holds ${MAX_ATTACHMENTS} files already; put the rest into one PDF`,
      );
    }
    const key = `scar/${car.id}/${randomUUID()}`;
    await this.storage.put(key, file.buffer);
    const att = em.create(ScarAttachment, {
      correctiveAction: car,
      filename: cleanName(file.originalname, type),
      contentType: type,
      sizeBytes: file.size,
      storageKey: key,
      addedBy: 'supplier',
    });
    this.audit.record(em, null, {
      action: 'corrective_action.attach',
      entityType: 'corrective_action',
      entityId: car.id,
      after: {
        number: car.number,
        filename: att.filename,
        via: 'supplier link',
        sentTo: link.sentTo,
      },
    });
    await em.flush();
    return {
      filename: att.filename,
      contentType: type,
      sizeBytes: att.sizeBytes,
      addedAt: att.createdAt,
    };
  }
}
