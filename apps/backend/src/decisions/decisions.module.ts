import { Module } from '@nestjs/common';
import { InspectionModule } from '../inspection/inspection.module';
import { AwaitingDecisionWatch } from './awaiting-decision.watch';
import { DecisionsController } from './decisions.controller';
import { DecisionsService } from './decisions.service';
import { InspectionStreams } from './inspection-streams';

/** Decisions on lots, nonconformance reports and the products' switching state. */
@Module({
  imports: [InspectionModule],
  controllers: [DecisionsController],
  providers: [DecisionsService, InspectionStreams, AwaitingDecisionWatch],
  exports: [DecisionsService],
})
export class DecisionsModule {}
