import { Module } from '@nestjs/common';
import { LotEvaluationService } from './lot-evaluation';

/** Samples, readings, their computation and the lot's evaluation. */
@Module({
  providers: [LotEvaluationService],
  exports: [LotEvaluationService],
})
export class InspectionModule {}
