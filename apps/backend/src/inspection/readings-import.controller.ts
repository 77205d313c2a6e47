import { Answers } from '../common/answers';
import { Controller, Headers, Post, Res, UploadedFile } from '@nestjs/common';
import { ApiHeader, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { FileUpload, singleFileInterceptor } from '../storage/single-file.interceptor';
import { MAX_IMPORT_ROWS, ReadingsImportService } from './readings-import.service';
import { IdParam } from '../common/id.pipe';

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
  @Answers('ImportAnswer')
  @Roles('clerk', 'qa_lead', 'admin')
  @FileUpload(
    CsvUpload,
    `CSV with a header row: unit, conductor, method, massG, lengthMm, count, strandDiameterMm, resistanceOhm, temperatureC, diameterMm, strandingIncrement, instruments (serials separated by ;), unitRef. At most ${MAX_IMPORT_ROWS} reading rows.`,
  )
  @ApiHeader({
    name: 'Idempotency-Key',
    required: false,
    description:
      "A key of the client's choosing (1 to 200 visible characters). A retry with the same key and file is answered with the first import's answer (header Idempotent-Replayed: true) and records nothing; without a key the file's SHA-256 serves as one.",
  })
  async import(
    @IdParam() lotId: number,
    @UploadedFile() file: Express.Multer.File | undefined,
    @CurrentUser() actor: RequestUser,
    @Headers('idempotency-key') key: string | undefined,
    @Res({ passthrough: true }) res: Response,
  ) {
    const { replayed, ...answer } = await this.imports.import(lotId, file, actor, key);
    if (replayed) res.setHeader('Idempotent-Replayed', 'true');
    return answer;
  }
}
