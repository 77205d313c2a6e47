import { Body, Controller, Get, Param, Patch, Post, Query, StreamableFile } from '@nestjs/common';
import { ApiProduces, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { attachmentName, CSV_CONTENT_TYPE, csvStream } from '../common/csv';
import { CreateReturnDto } from './dto/create-return.dto';
import { EmailReturnDto } from './dto/email-return.dto';
import { ListReturnsDto } from './dto/list-returns.dto';
import { UpdateReturnDto } from './dto/update-return.dto';
import { ReturnDocuments } from './return-documents';
import { ReturnMailService } from './return-mail.service';
import { RETURN_LIST_HEADER, returnListRows } from './return-list-csv';
import { refOf, ReturnsService } from './returns.service';
import { IdPipe } from '../common/id.pipe';

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
  create(@Body() dto: CreateReturnDto, @CurrentUser() actor: RequestUser) {
    return this.returns.create(dto, actor);
  }

  @Get()
  list(@Query() q: ListReturnsDto) {
    return this.returns.list(q);
  }

  @Get('export.csv')
  @ApiProduces('text/csv')
  exportList(@Query() q: ListReturnsDto) {
    return new StreamableFile(
      csvStream(RETURN_LIST_HEADER, returnListRows(this.returns.listBlocks(q))),
      {
        type: CSV_CONTENT_TYPE,
        disposition: attachmentName('returns.csv'),
      },
    );
  }

  @Get(':id')
  get(@Param('id', IdPipe) id: number) {
    return this.returns.get(id);
  }

  @Patch(':id')
  update(
    @Param('id', IdPipe) id: number,
    @Body() dto: UpdateReturnDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.returns.update(id, dto, actor);
  }

  /** One row per reading of every lot on the return. */
  @Get(':id/export.csv')
  @ApiProduces('text/csv')
  async exportReadings(@Param('id', IdPipe) id: number, @CurrentUser() actor: RequestUser) {
    const ret = await this.returns.ref(id);
    await this.mail.recordExport(ret, 'CSV', actor);
    return new StreamableFile(this.documents.csvStream(ret), {
      type: CSV_CONTENT_TYPE,
      disposition: attachmentName(`${ret.number}-readings.csv`),
    });
  }

  @Get(':id/evidence.pdf')
  @ApiProduces('application/pdf')
  async evidence(@Param('id', IdPipe) id: number, @CurrentUser() actor: RequestUser) {
    const ret = await this.returns.loadForDocuments(id);
    const pdf = await this.documents.pdf(ret);
    await this.mail.recordExport(refOf(ret), 'evidence pack', actor);
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      disposition: `inline; filename="${ret.number}-evidence.pdf"`,
    });
  }

  @Post(':id/email')
  email(
    @Param('id', IdPipe) id: number,
    @Body() dto: EmailReturnDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.mail.email(id, dto, actor);
  }
}
