import { Module } from '@nestjs/common';
import { ChangeCounters } from '../common/change-counters';
import { LotListCache } from './lot-list-cache';
import { LotsController } from './lots.controller';
import { LotsService } from './lots.service';

@Module({
  controllers: [LotsController],
  providers: [LotsService, LotListCache, ChangeCounters],
  exports: [LotsService],
})
export class LotsModule {}
