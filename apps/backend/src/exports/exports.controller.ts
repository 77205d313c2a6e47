import { Answers } from '../common/answers';
import { Logger, Controller, Get, Param, Query, Res } from '@nestjs/common';
import { ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { once } from 'node:events';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ReadingsExportQueryDto } from './dto/readings-export-query.dto';
import { ReadingsExportService } from './readings-export.service';
import { IdPipe } from '../common/id.pipe';

@ApiTags('exports')
@Controller()
export class ExportsController {
  constructor(private readonly readings: ReadingsExportService) {}

  /**
   * Streams the CSV as pages arrive, waiting for the client to drain the socket, so the
   * file is never built in memory. Errors before the first byte get the usual JSON body;
   * after it, the connection is cut so a truncated file cannot pass for a whole one.
   */
  @Get('suppliers/:id/readings/export.csv')
  @Answers.file('text/csv')
  @Roles('purchasing', 'qa_lead', 'admin')
  @ApiProduces('text/csv')
  async supplierReadings(
    @Param('id', IdPipe) id: number,
    @Query() q: ReadingsExportQueryDto,
    @CurrentUser() actor: RequestUser,
    @Res() res: Response,
  ): Promise<void> {
    const out = await this.readings.start(id, q.from, q.to, actor);
    res.status(200);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${out.filename}"`);
    res.setHeader('Cache-Control', 'no-store');
    try {
      for await (const chunk of out.chunks) {
        if (res.destroyed) break;
        if (!res.write(chunk)) await Promise.race([once(res, 'drain'), once(res, 'close')]);
      }
      res.end();
    } catch (e) {
      if (!res.headersSent) throw e;
      // The status line is gone: cut the download short and keep the cause for support.
      new Logger('Exports').error({ err: e }, 'Readings export failed mid-stream');
      res.destroy(e instanceof Error ? e : new Error(String(e)));
    }
  }
}
