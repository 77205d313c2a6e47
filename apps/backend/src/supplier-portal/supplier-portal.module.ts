import { Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module';
import { ReturnsModule } from '../returns/returns.module';
import { SupplierPortalController } from './supplier-portal.controller';
import { SupplierPortalService } from './supplier-portal.service';

/** The supplier's page for a corrective-action request, reached by a signed link. */
@Module({
  imports: [MailModule, ReturnsModule],
  controllers: [SupplierPortalController],
  providers: [SupplierPortalService],
  exports: [SupplierPortalService],
})
export class SupplierPortalModule {}
