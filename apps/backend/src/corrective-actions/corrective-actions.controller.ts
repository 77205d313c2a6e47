import { Answers, PostAction } from '../common/answers';
import { Body, Controller, Get, Patch, Post, Query, Res, StreamableFile } from '@nestjs/common';
import type { Response } from 'express';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { csvDownload, csvStream } from '../common/csv';
import { CAR_CSV_HEADER, correctiveActionRows } from './corrective-action-csv';
import { CorrectiveActionsService } from './corrective-actions.service';
import { SendCorrectiveActionDto } from './dto/send-corrective-action.dto';
import { ScarLinks } from './scar-links.service';
import { CreateCorrectiveActionDto } from './dto/create-corrective-action.dto';
import { ListCorrectiveActionsDto } from './dto/list-corrective-actions.dto';
import { UpdateCorrectiveActionDto } from './dto/update-corrective-action.dto';
import { IdParam } from '../common/id.pipe';

@ApiTags('corrective-actions')
@Controller('corrective-actions')
@Roles('purchasing', 'qa_lead', 'admin')
export class CorrectiveActionsController {
  constructor(
    private readonly cars: CorrectiveActionsService,
    private readonly portal: ScarLinks,
  ) {}

  @Post()
  @Answers('CorrectiveAction')
  create(@Body() dto: CreateCorrectiveActionDto, @CurrentUser() actor: RequestUser) {
    return this.cars.create(dto, actor);
  }

  @Get()
  @Answers('CorrectiveActionPage')
  list(@Query() q: ListCorrectiveActionsDto) {
    return this.cars.list(q);
  }

  @Get('export.csv')
  @Answers.file('text/csv')
  export(@Query() q: ListCorrectiveActionsDto) {
    const rows = correctiveActionRows(this.cars.listBlocks(q));
    return csvDownload('corrective-actions.csv', csvStream(CAR_CSV_HEADER, rows));
  }

  @Get(':id')
  @Answers('CorrectiveAction')
  get(@IdParam() id: number) {
    return this.cars.get(id);
  }

  /**
   * A reopen e-mails the comment to the supplier with a new link; when that cannot be sent
   * (no address) the reopen stands and `mail` says why.
   */
  @Patch(':id')
  @Answers('CorrectiveActionUpdate')
  async update(
    @IdParam() id: number,
    @Body() dto: UpdateCorrectiveActionDto,
    @CurrentUser() actor: RequestUser,
  ) {
    const before = await this.cars.get(id);
    const car = await this.cars.update(id, dto, actor);
    if (car.status !== 'reopened' || before.status === 'reopened') return car;
    try {
      const sent = await this.portal.send(
        id,
        { message: dto.comment },
        actor,
        'We reopened our corrective action request and need more from you',
      );
      return { ...car, mail: { status: sent.message.status, to: sent.message.to } };
    } catch (e) {
      return { ...car, mail: { status: 'not sent', error: (e as Error).message } };
    }
  }

  /** E-mails the supplier a signed link (30 days) to a page where it answers. */
  @Post(':id/send')
  @Answers('SupplierLinkSent')
  send(
    @IdParam() id: number,
    @Body() dto: SendCorrectiveActionDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.portal.send(id, dto, actor);
  }

  /** Withdraws every link sent for the request. */
  @PostAction(':id/revoke-links', 'LinksRevoked')
  revoke(@IdParam() id: number, @CurrentUser() actor: RequestUser) {
    return this.portal.revoke(id, actor);
  }

  @Get(':id/attachments')
  @Answers('ScarAttachmentList')
  attachments(@IdParam() id: number) {
    return this.portal.attachments(id);
  }

  @Get(':id/attachments/:fileId')
  @Answers.file('application/octet-stream')
  async attachment(
    @IdParam() id: number,
    @IdParam('fileId') fileId: number,
    @Res({ passthrough: true }) res: Response,
  ) {
    const { stream, att } = await this.portal.openAttachment(id, fileId);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    return new StreamableFile(stream, {
      type: att.contentType,
      disposition: `attachment; filename="${att.filename.replace(/[^\x20-\x7e]/g, '_')}"`,
    });
  }
}
