import { Injectable, OnModuleInit, UnprocessableEntityException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { MailService, type MailAttachment } from '../mail/mail.service';
import type { MessageView } from '../mail/message-view';
import { EmailReturnDto } from './dto/email-return.dto';
import type { VendorReturn } from './entities/vendor-return.entity';
import { ReturnDocuments } from './return-documents';
import { ReturnsService, type ReturnRef } from './returns.service';

const RELATED = 'vendor_return';

/** An amount with its ISO 4217 code, e.g. "EUR 1,234.50". */
export function money(amount: number, currency: string): string {
  return `${currency} ${amount.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;
}

/** E-mails a return to the supplier with its CSV and evidence pack attached. */
@Injectable()
export class ReturnMailService implements OnModuleInit {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly returns: ReturnsService,
    private readonly documents: ReturnDocuments,
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
      throw new UnprocessableEntityException(
        `${draft.supplier.name} has no contact e-mail: add one to the supplier or give an address`,
      );
    }
    // The return is marked e-mailed before its documents are built, so they say so.
    await this.returns.markEmailed(id, actor);
    em.clear();
    const ret = await this.returns.load(em, id);
    const lots = ret.lots
      .getItems()
      .map((l) => `lot ${l.id} (PO ${l.poNumber})`)
      .join(', ');
    const body = [
      dto.message?.trim(),
      `Return to vendor ${ret.number}${ret.rmaNumber ? `, your RMA ${ret.rmaNumber}` : ''}.`,
      `We rejected ${lots} at receiving inspection: the attached evidence pack shows the sampling plan, every reading with its uncertainty and the decision; the CSV holds the readings.`,
      `Chargeback: ${money(ret.chargebackTotal, ret.currency)}.`,
      'Please confirm the return and send us your corrective action.',
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
          status: message.status,
          error: message.error,
        },
      });
    }
    await em.flush();
    return message;
  }

  /**
   * One `return.export` event per lot of the return, so each lot's timeline shows the
   * evidence went out: one insert, however many lots a recall holds.
   */
  async recordExport(ret: ReturnRef, format: 'CSV' | 'evidence pack', actor: RequestUser) {
    await this.audit.append(
      this.em.fork(),
      actor,
      ret.lotIds.map((lotId) => ({
        action: 'return.export',
        entityType: 'vendor_return',
        entityId: ret.id,
        lotId,
        after: { number: ret.number, format },
      })),
    );
  }
}
