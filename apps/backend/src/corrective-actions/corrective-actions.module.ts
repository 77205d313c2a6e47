import { Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module';
import { CorrectiveActionsController } from './corrective-actions.controller';
import { CorrectiveActionsService } from './corrective-actions.service';
import { OverdueWatch } from './overdue.watch';
import { ScarLinks } from './scar-links.service';

/** Supplier corrective action requests (SCAR). */
@Module({
  imports: [MailModule],
  controllers: [CorrectiveActionsController],
  providers: [CorrectiveActionsService, ScarLinks, OverdueWatch],
})
export class CorrectiveActionsModule {}
