import { Module } from '@nestjs/common';
import { InspectionModule } from '../inspection/inspection.module';
import { LotPageController } from './lot-page.controller';
import { LotPageService } from './lot-page.service';

/** The Lot page (GET /lots/:id): a read model over lots, inspection, decisions and photos. */
@Module({
  imports: [InspectionModule],
  controllers: [LotPageController],
  providers: [LotPageService],
})
export class LotPageModule {}
