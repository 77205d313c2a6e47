import { Answers, PostAction } from '../common/answers';
import { Body, Controller, Get, Patch, Post, Query, StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { csvDownload, csvStream } from '../common/csv';
import { CreateReturnDto } from './dto/create-return.dto';
import { EmailReturnDto } from './dto/email-return.dto';
import { EvidenceQueryDto } from './dto/evidence-query.dto';
import { ListReturnsDto } from './dto/list-returns.dto';
import {
  AcknowledgeReturnDto,
  CancelReturnDto,
  CreditReturnDto,
  ReturnStepDto,
  ShipReturnDto,
} from './dto/return-steps.dto';
import { UpdateReturnDto } from './dto/update-return.dto';
import { ReturnDocuments } from './return-documents';
import { ReturnMailService } from './return-mail.service';
import { RETURN_LIST_HEADER, returnListRows } from './return-list-csv';
import { refOf, ReturnsService } from './returns.service';
import { IdParam } from '../common/id.pipe';

@ApiTags('returns')
@Controller('returns')
@Roles('purchasing', 'admin')
export class ReturnsController {
  constructor(
    private readonly returns: ReturnsService,
    private readonly documents: ReturnDocuments,
    private readonly mail: ReturnMailService,
  ) {}

  @Post()
  @Answers('VendorReturn')
  create(@Body() dto: CreateReturnDto, @CurrentUser() actor: RequestUser) {
    return this.returns.create(dto, actor);
  }

  @Get()
  @Answers('VendorReturnPage')
  list(@Query() q: ListReturnsDto) {
    return this.returns.list(q);
  }

  @Get('export.csv')
  @Answers.file('text/csv')
  exportList(@Query() q: ListReturnsDto) {
    const rows = returnListRows(this.returns.listBlocks(q));
    return csvDownload('returns.csv', csvStream(RETURN_LIST_HEADER, rows));
  }

  /** Rejected lots that are on no return yet, for purchasing's Today. */
  @Get('unreturned-lots')
  @Answers('UnreturnedLots')
  unreturnedLots() {
    return this.returns.unreturnedLots();
  }

  @Get(':id')
  @Answers('VendorReturn')
  get(@IdParam() id: number) {
    return this.returns.get(id);
  }

  @Patch(':id')
  @Answers('VendorReturn')
  update(@IdParam() id: number, @Body() dto: UpdateReturnDto, @CurrentUser() actor: RequestUser) {
    return this.returns.update(id, dto, actor);
  }

  /** A draft that should not go: its lots are freed for another return. */
  @PostAction(':id/cancel', 'VendorReturn')
  cancel(@IdParam() id: number, @Body() dto: CancelReturnDto, @CurrentUser() actor: RequestUser) {
    return this.returns.cancel(id, dto, actor);
  }

  /** The goods left, with carrier, tracking number, date and quantity. */
  @PostAction(':id/ship', 'VendorReturn')
  ship(@IdParam() id: number, @Body() dto: ShipReturnDto, @CurrentUser() actor: RequestUser) {
    return this.returns.ship(id, dto, actor);
  }

  @PostAction(':id/acknowledge', 'VendorReturn')
  acknowledge(
    @IdParam() id: number,
    @Body() dto: AcknowledgeReturnDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.returns.acknowledge(id, dto, actor);
  }

  /** The supplier's credit note for the chargeback. */
  @PostAction(':id/credit', 'VendorReturn')
  credit(@IdParam() id: number, @Body() dto: CreditReturnDto, @CurrentUser() actor: RequestUser) {
    return this.returns.credit(id, dto, actor);
  }

  @PostAction(':id/close', 'VendorReturn')
  close(@IdParam() id: number, @Body() dto: ReturnStepDto, @CurrentUser() actor: RequestUser) {
    return this.returns.close(id, dto, actor);
  }

  /** One row per reading of every lot on the return. */
  @Get(':id/export.csv')
  @Answers.file('text/csv')
  async exportReadings(@IdParam() id: number, @CurrentUser() actor: RequestUser) {
    const ret = await this.returns.ref(id);
    await this.mail.recordExport(ret, 'CSV', actor);
    return csvDownload(`${ret.number}-readings.csv`, this.documents.csvStream(ret));
  }

  @Get(':id/evidence.pdf')
  @Answers.file('application/pdf')
  async evidence(
    @IdParam() id: number,
    @Query() q: EvidenceQueryDto,
    @CurrentUser() actor: RequestUser,
  ) {
    const ret = await this.returns.loadForDocuments(id);
    const pdf = await this.documents.pdf(ret, q.paper === 'letter' ? 'LETTER' : 'A4');
    await this.mail.recordExport(refOf(ret), 'evidence pack', actor);
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      disposition: `inline; filename="${ret.number}-evidence.pdf"`,
    });
  }

  @Post(':id/email')
  @Answers('OutboundMessage')
  email(@IdParam() id: number, @Body() dto: EmailReturnDto, @CurrentUser() actor: RequestUser) {
    return this.mail.email(id, dto, actor);
  }

  /** Withdraws the supplier's links to the notice's page (e.g. sent to a wrong address). */
  @PostAction(':id/revoke-links', 'LinksRevoked')
  revokeLinks(@IdParam() id: number, @CurrentUser() actor: RequestUser) {
    return this.mail.revokeLinks(id, actor);
  }
}
