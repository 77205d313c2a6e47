import { Answers } from '../common/answers';
import { Body, Controller, Get, Post, Query, Res, StreamableFile } from '@nestjs/common';
import { ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { attachmentName, CSV_CONTENT_TYPE, csvStream } from '../common/csv';
import { sendJson } from '../common/json-answer';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';
import { CreateLotDto, ReceivedBeforeQueryDto } from './dto/create-lot.dto';
import { LotFiltersDto } from './dto/list-lots.dto';
import { LOT_CSV_COLUMNS } from './lots-csv';
import { LotsService } from './lots.service';

/** Receiving and the lot list. The Lot page (GET /lots/:id) is the lot-page module's. */
@ApiTags('lots')
@Controller('lots')
export class LotsController {
  constructor(private readonly lots: LotsService) {}

  @Post()
  @Answers('ReceivedLot')
  @Roles('clerk', 'qa_lead', 'admin')
  create(@Body() dto: CreateLotDto, @CurrentUser() actor: RequestUser) {
    return this.lots.create(dto, actor);
  }

  /** Receiving warns before saving: the lots already received under this PO and slip. */
  @Get('received-before')
  @Answers('ReceivedBefore')
  @Roles('clerk', 'qa_lead', 'admin')
  receivedBefore(@Query() query: ReceivedBeforeQueryDto) {
    return this.lots.receivedBefore(query.poNumber, query.packingSlip);
  }

  @Get()
  @Answers('LotSummaryPage')
  @Roles(...ALL_ROLES)
  async list(@Query() query: LotFiltersDto, @Res() res: Response) {
    // Sent as the cached JSON answer: the page of LotSummary (docs/api-conventions.md).
    sendJson(res, await this.lots.listAnswer(query));
  }

  @Get('export.csv')
  @Answers.file('text/csv')
  @Roles(...ALL_ROLES)
  @ApiProduces('text/csv')
  async exportCsv(@Query() query: LotFiltersDto, @CurrentUser() actor: RequestUser) {
    const rows = await this.lots.exportRows(query, actor);
    return new StreamableFile(csvStream(LOT_CSV_COLUMNS, rows), {
      type: CSV_CONTENT_TYPE,
      disposition: attachmentName('lots.csv'),
    });
  }
}
