import { Module } from '@nestjs/common';
import { GroupCommit } from '../common/group-commit';
import { InspectionController } from './inspection.controller';
import { LotEvaluationService } from './lot-evaluation';
import { ReadingsImportController } from './readings-import.controller';
import { ReadingsImportService } from './readings-import.service';
import { ReadingsService } from './readings.service';
import { ReadingWriter } from './reading-writer';
import { SamplesService } from './samples.service';

/** Samples, readings, their computation, the lot's status flow and its evaluation. */
@Module({
  controllers: [InspectionController, ReadingsImportController],
  providers: [
    GroupCommit,
    LotEvaluationService,
    SamplesService,
    ReadingsService,
    ReadingWriter,
    ReadingsImportService,
  ],
  exports: [LotEvaluationService],
})
export class InspectionModule {}
