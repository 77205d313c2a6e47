import { Global, Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module';
import { NoticesController } from './notices.controller';
import { NoticesService } from './notices.service';

/** E-mail notices to staff and their daily digest; global so any domain can raise one. */
@Global()
@Module({
  imports: [MailModule],
  controllers: [NoticesController],
  providers: [NoticesService],
  exports: [NoticesService],
})
export class NoticesModule {}
