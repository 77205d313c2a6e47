import { Module } from '@nestjs/common';
import { CorrectiveActionsController } from './corrective-actions.controller';
import { CorrectiveActionsService } from './corrective-actions.service';

/** Supplier corrective action requests (SCAR). */
@Module({ controllers: [CorrectiveActionsController], providers: [CorrectiveActionsService] })
export class CorrectiveActionsModule {}
