import { Module } from '@nestjs/common';
import { ExportsController } from './exports.controller';
import { ReadingsExportQuery } from './readings-export.query';
import { ReadingsExportService } from './readings-export.service';

/** Large CSV exports, streamed page by page. */
@Module({
  controllers: [ExportsController],
  providers: [ReadingsExportService, ReadingsExportQuery],
  exports: [ReadingsExportService],
})
export class ExportsModule {}
