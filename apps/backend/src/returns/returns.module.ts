import { Module } from '@nestjs/common';
import { ExportsModule } from '../exports/exports.module';
import { InspectionModule } from '../inspection/inspection.module';
import { MailModule } from '../mail/mail.module';
import { ReturnDocuments } from './return-documents';
import { ReturnEvidence } from './return-evidence';
import { ReturnMailService } from './return-mail.service';
import { ReturnsController } from './returns.controller';
import { ReturnsService } from './returns.service';

/** Returns to vendor: rejected lots of one supplier, their evidence, CSV and e-mail. */
@Module({
  imports: [ExportsModule, InspectionModule, MailModule],
  controllers: [ReturnsController],
  providers: [ReturnsService, ReturnEvidence, ReturnDocuments, ReturnMailService],
  exports: [ReturnDocuments],
})
export class ReturnsModule {}
