import { Module } from '@nestjs/common';
import { SupplierPortalModule } from '../supplier-portal/supplier-portal.module';
import { CorrectiveActionsController } from './corrective-actions.controller';
import { CorrectiveActionsService } from './corrective-actions.service';

/** Supplier corrective action requests (SCAR). */
@Module({
  imports: [SupplierPortalModule],
  controllers: [CorrectiveActionsController],
  providers: [CorrectiveActionsService],
})
export class CorrectiveActionsModule {}
