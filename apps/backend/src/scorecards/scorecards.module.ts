import { Module } from '@nestjs/common';
import { ChangeCounters } from '../common/change-counters';
import { ScorecardCache } from './scorecard-cache';
import { ScorecardExportService } from './scorecard-export.service';
import { ScorecardsController } from './scorecards.controller';
import { ScorecardsService } from './scorecards.service';
import { SupplierDetailQuery } from './supplier-detail.query';
import { SupplierMetricsQuery } from './supplier-metrics.query';

/** Supplier scorecards: SQL aggregates over lots, readings, SCARs and returns; CSV. */
@Module({
  controllers: [ScorecardsController],
  providers: [
    ScorecardCache,
    ChangeCounters,
    ScorecardsService,
    ScorecardExportService,
    SupplierMetricsQuery,
    SupplierDetailQuery,
  ],
})
export class ScorecardsModule {}
