import { Module } from '@nestjs/common';
import { LotListCache } from './lot-list-cache';
import { LotsController } from './lots.controller';
import { LotsService } from './lots.service';

@Module({
  controllers: [LotsController],
  providers: [LotsService, LotListCache],
  exports: [LotsService],
})
export class LotsModule {}
