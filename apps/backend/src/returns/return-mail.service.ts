import { DomainError } from '../common/domain-error';
import { Inject, Injectable, OnModuleInit } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { isoDate } from '../common/calendar';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { MailService, type MailAttachment } from '../mail/mail.service';
import type { MessageView } from '../mail/message-view';
import { ReturnLink } from './entities/return-link.entity';
import { createSignedLink } from '../corrective-actions/signed-links';
import { EmailReturnDto } from './dto/email-return.dto';
import { VendorReturn as VendorReturnEntity } from './entities/vendor-return.entity';
import type { VendorReturn } from './entities/vendor-return.entity';
import { ReturnDocuments } from './return-documents';
import { money } from './return-money';
import { ReturnsService, type ReturnRef } from './returns.service';
import { clock } from '../common/clock';

const RELATED = 'vendor_return';

// The evidence pack prints amounts the same way.
export { money };

/** E-mails a return to the supplier with its CSV and evidence pack attached. */
@Injectable()
export class ReturnMailService implements OnModuleInit {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly returns: ReturnsService,
    private readonly documents: ReturnDocuments,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  onModuleInit(): void {
    // A retried message gets its attachments rebuilt from the return as it is now.
    this.mail.registerAttachmentSource(RELATED, async (id) =>
      this.attachments(await this.returns.load(this.em.fork(), id)),
    );
  }

  async attachments(ret: VendorReturn): Promise<MailAttachment[]> {
    return [
      {
        filename: `${ret.number}-readings.csv`,
        contentType: 'text/csv; charset=utf-8',
        content: await this.documents.csvBuffer(ret),
      },
      {
        filename: `${ret.number}-evidence.pdf`,
        contentType: 'application/pdf',
        content: await this.documents.pdf(ret),
      },
    ];
  }

  async email(id: number, dto: EmailReturnDto, actor: RequestUser): Promise<MessageView> {
    const em = this.em.fork();
    const draft = await this.returns.load(em, id);
    const to = dto.to ?? draft.supplier.contactEmail;
    if (!to) {
      throw DomainError.refused(
        `${draft.supplier.name} has no contact e-mail: add one to the supplier or give an address`,
      );
    }
    // The return is marked e-mailed before its documents are built, so they say so.
    await this.returns.markEmailed(id, actor);
    em.clear();
    const ret = await this.returns.load(em, id);
    // The supplier's own page for this notice: what was found, the photos, the evidence pack.
    const { link, url } = createSignedLink(
      em,
      this.config,
      ReturnLink,
      { vendorReturn: ret },
      to,
      actor.id,
    );
    await em.flush();
    const lots = ret.lots
      .getItems()
      .map((l) => `PO ${l.poNumber}${l.supplierLotCode ? ` (your lot ${l.supplierLotCode})` : ''}`)
      .join(', ');
    const body = [
      dto.message?.trim(),
      `We are returning goods to you: return ${ret.number}${ret.rmaNumber ? `, your RMA ${ret.rmaNumber}` : ''}.`,
      `Deliveries concerned: ${lots}. They failed our receiving inspection.`,
      ret.supplierNote?.trim() ? `Why: ${ret.supplierNote.trim()}` : null,
      `Chargeback for inspection and handling: ${money(ret.chargebackTotal, ret.currency)}.`,
      `See what we found, with the photos and the evidence pack, on this page (no account needed; the link works until ${isoDate(link.expiresAt)}):`,
      url,
      'Attached: the evidence pack (PDF: sampling plan, every reading with its uncertainty, the decision) and the readings (CSV).',
      'Please confirm the return by replying to this e-mail, and send us your corrective action.',
    ]
      .filter(Boolean)
      .join('\n\n');
    const message = await this.mail.send(
      {
        to,
        subject: `Return ${ret.number}: rejected cable from ${ret.supplier.name}`,
        body,
        attachments: await this.attachments(ret),
        relatedType: RELATED,
        relatedId: ret.id,
      },
      actor,
    );
    for (const lot of ret.lots.getItems()) {
      this.audit.record(em, actor, {
        action: 'return.email',
        entityType: 'vendor_return',
        entityId: ret.id,
        lotId: lot.id,
        after: {
          number: ret.number,
          to,
          messageId: message.id,
          linkId: link.id,
          status: message.status,
          error: message.error,
        },
      });
    }
    await em.flush();
    return message;
  }

  /** Withdraws every link to the return's notice page: they answer 410 from now on. */
  async revokeLinks(id: number, actor: RequestUser): Promise<{ revoked: number }> {
    const em = this.em.fork();
    const ret = await em.findOne(VendorReturnEntity, id);
    if (!ret) throw DomainError.notFound(`There is no return ${id}`);
    const revoked = await em.nativeUpdate(
      ReturnLink,
      { vendorReturn: id, revokedAt: null },
      { revokedAt: clock.now() },
    );
    this.audit.record(em, actor, {
      action: 'return.revoke_links',
      entityType: 'vendor_return',
      entityId: id,
      after: { number: ret.number, revoked },
    });
    await em.flush();
    return { revoked };
  }

  /**
   * One `return.export` event per lot of the return, so each lot's timeline shows the
   * evidence went out: a few multi-row inserts in one transaction, so one commit (one
   * fsync under `synchronous = FULL`) however many lots a recall holds. Each insert
   * committed alone before: two commits for the bench set's 128-lot return.
   */
  async recordExport(ret: ReturnRef, format: 'CSV' | 'evidence pack', actor: RequestUser) {
    await this.em.fork().transactional((em) =>
      this.audit.append(
        em,
        actor,
        ret.lotIds.map((lotId) => ({
          action: 'return.export',
          entityType: 'vendor_return',
          entityId: ret.id,
          lotId,
          after: { number: ret.number, format },
        })),
      ),
    );
  }
}
