import { Module } from '@nestjs/common';
import { InspectionController } from './inspection.controller';
import { LotDetailController } from './lot-detail.controller';
import { LotDetailService } from './lot-detail.service';
import { LotEvaluationService } from './lot-evaluation';
import { LotStatusService } from './lot-status';
import { ReadingsService } from './readings.service';
import { SamplesService } from './samples.service';

/** Samples, readings, their computation, the lot's status flow and its evaluation. */
@Module({
  controllers: [InspectionController, LotDetailController],
  providers: [
    LotEvaluationService,
    LotDetailService,
    LotStatusService,
    SamplesService,
    ReadingsService,
  ],
  exports: [LotEvaluationService],
})
export class InspectionModule {}
