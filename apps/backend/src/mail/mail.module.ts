import { Module } from '@nestjs/common';
import { MailService } from './mail.service';
import { MessagesController } from './messages.controller';

/** Outbound e-mail over SMTP, every message stored with its status. */
@Module({ controllers: [MessagesController], providers: [MailService], exports: [MailService] })
export class MailModule {}
