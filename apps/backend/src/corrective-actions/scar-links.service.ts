import { Inject, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { isoDate } from '../common/calendar';
import { clock } from '../common/clock';
import { DomainError } from '../common/domain-error';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { MailService } from '../mail/mail.service';
import type { MessageView } from '../mail/message-view';
import { StorageService } from '../storage/storage.service';
import { SendCorrectiveActionDto } from './dto/send-corrective-action.dto';
import { CorrectiveAction } from './entities/corrective-action.entity';
import { ScarAttachment } from './entities/scar-attachment.entity';
import { SupplierLink } from './entities/supplier-link.entity';
import { createSignedLink } from './signed-links';

/**
 * Staff's side of a request's supplier links: e-mailing the supplier a signed link to its
 * page (the supplier portal answers it), withdrawing them, and the files the supplier sent.
 */
@Injectable()
export class ScarLinks {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly storage: StorageService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** E-mails the supplier a new link to answer the request (also after a reopen). */
  async send(
    id: number,
    dto: SendCorrectiveActionDto,
    actor: RequestUser,
    opening = 'We ask you for a corrective action',
  ): Promise<{ message: MessageView; link: { id: number; expiresAt: Date } }> {
    const em = this.em.fork();
    const car = await em.findOne(CorrectiveAction, id, { populate: ['supplier', 'lots'] });
    if (!car) throw DomainError.notFound(`There is no corrective action ${id}`);
    if (car.status === 'verified' || car.status === 'closed') {
      throw DomainError.refused(
        `${car.number} is ${car.status}: there is nothing left for the supplier to answer`,
      );
    }
    const to = dto.to ?? car.supplier.contactEmail;
    if (!to) {
      throw DomainError.refused(
        `${car.supplier.name} has no contact e-mail: add one to the supplier or give an address`,
      );
    }
    const { link, url } = createSignedLink(
      em,
      this.config,
      SupplierLink,
      { correctiveAction: car },
      to,
      actor.id,
    );
    await em.flush();
    const lots = car.lots
      .getItems()
      .map((l) => `PO ${l.poNumber}${l.supplierLotCode ? ` (your lot ${l.supplierLotCode})` : ''}`)
      .join(', ');
    const body = [
      dto.message?.trim(),
      `${opening}: ${car.number}.`,
      `What we found: ${car.problem}`,
      lots ? `Deliveries concerned: ${lots}.` : null,
      `Please answer by ${car.dueOn} with your containment, root cause, corrective action and the date it will be in place, on this page (no account needed; the link works until ${isoDate(link.expiresAt)}):`,
      url,
    ]
      .filter(Boolean)
      .join('\n\n');
    const message = await this.mail.send(
      {
        to,
        subject: `${car.number}: corrective action requested`,
        body,
        attachments: [],
        relatedType: 'corrective_action',
        relatedId: car.id,
      },
      actor,
    );
    this.audit.record(em, actor, {
      action: 'corrective_action.send',
      entityType: 'corrective_action',
      entityId: car.id,
      after: {
        number: car.number,
        to,
        linkId: link.id,
        expiresAt: link.expiresAt,
        messageId: message.id,
      },
    });
    await em.flush();
    return { message, link: { id: link.id, expiresAt: link.expiresAt } };
  }

  /** Withdraws every link of the request: they answer 410 from now on. */
  async revoke(id: number, actor: RequestUser): Promise<{ revoked: number }> {
    const em = this.em.fork();
    const car = await em.findOne(CorrectiveAction, id);
    if (!car) throw DomainError.notFound(`There is no corrective action ${id}`);
    const revoked = await em.nativeUpdate(
      SupplierLink,
      { correctiveAction: id, revokedAt: null },
      { revokedAt: clock.now() },
    );
    this.audit.record(em, actor, {
      action: 'corrective_action.revoke_links',
      entityType: 'corrective_action',
      entityId: id,
      after: { number: car.number, revoked },
    });
    await em.flush();
    return { revoked };
  }

  /** Staff: the files of a request, and one file's bytes. */
  async attachments(carId: number) {
    const rows = await this.em
      .fork()
      .find(ScarAttachment, { correctiveAction: carId }, { orderBy: { id: 'asc' } });
    return rows.map((a) => ({
      id: a.id,
      filename: a.filename,
      contentType: a.contentType,
      sizeBytes: a.sizeBytes,
      addedBy: a.addedBy,
      createdAt: a.createdAt,
    }));
  }

  async openAttachment(carId: number, id: number) {
    const att = await this.em.fork().findOne(ScarAttachment, { id, correctiveAction: carId });
    if (!att) throw DomainError.notFound(`There is no file ${id} on this request`);
    return { stream: await this.storage.get(att.storageKey), att };
  }
}
