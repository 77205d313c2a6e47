import { Module } from '@nestjs/common';
import { LotCountCache } from './lot-count-cache';
import { LotsController } from './lots.controller';
import { LotsService } from './lots.service';

@Module({
  controllers: [LotsController],
  providers: [LotsService, LotCountCache],
  exports: [LotsService],
})
export class LotsModule {}
