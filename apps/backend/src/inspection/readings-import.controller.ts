import { Controller, Param, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { singleFileInterceptor } from '../storage/single-file.interceptor';
import { ReadingsImportService } from './readings-import.service';
import { IdPipe } from '../common/id.pipe';

/** 2 MB holds tens of thousands of bench-logger rows (issue 4; no source). */
const CsvUpload = singleFileInterceptor(
  2 * 1024 * 1024,
  'The CSV is larger than 2 MB: split it into several files and import them one by one.',
);

@ApiTags('inspection')
@Controller('lots')
export class ReadingsImportController {
  constructor(private readonly imports: ReadingsImportService) {}

  @Post(':id/readings/import')
  @Roles('clerk', 'qa_lead', 'admin')
  @UseInterceptors(CsvUpload)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: {
        file: {
          type: 'string',
          format: 'binary',
          description:
            'CSV with a header row: unit, conductor, method, massG, lengthMm, count, strandDiameterMm, resistanceOhm, temperatureC, diameterMm, strandingIncrement, instruments (serials separated by ;), unitRef',
        },
      },
    },
  })
  import(
    @Param('id', IdPipe) lotId: number,
    @UploadedFile() file: Express.Multer.File | undefined,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.imports.import(lotId, file, actor);
  }
}
