import { Body, Controller, Get, Param, Patch, Post, Query, StreamableFile } from '@nestjs/common';
import { ApiProduces, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { attachmentName, CSV_CONTENT_TYPE, csvStream } from '../common/csv';
import { CAR_CSV_HEADER, correctiveActionRows } from './corrective-action-csv';
import { CorrectiveActionsService } from './corrective-actions.service';
import { CreateCorrectiveActionDto } from './dto/create-corrective-action.dto';
import { ListCorrectiveActionsDto } from './dto/list-corrective-actions.dto';
import { UpdateCorrectiveActionDto } from './dto/update-corrective-action.dto';
import { IdPipe } from '../common/id.pipe';

@ApiTags('corrective-actions')
@Controller('corrective-actions')
@Roles('purchasing', 'qa_lead', 'admin')
export class CorrectiveActionsController {
  constructor(private readonly cars: CorrectiveActionsService) {}

  @Post()
  create(@Body() dto: CreateCorrectiveActionDto, @CurrentUser() actor: RequestUser) {
    return this.cars.create(dto, actor);
  }

  @Get()
  list(@Query() q: ListCorrectiveActionsDto) {
    return this.cars.list(q);
  }

  @Get('export.csv')
  @ApiProduces('text/csv')
  export(@Query() q: ListCorrectiveActionsDto) {
    return new StreamableFile(
      csvStream(CAR_CSV_HEADER, correctiveActionRows(this.cars.listBlocks(q))),
      {
        type: CSV_CONTENT_TYPE,
        disposition: attachmentName('corrective-actions.csv'),
      },
    );
  }

  @Get(':id')
  get(@Param('id', IdPipe) id: number) {
    return this.cars.get(id);
  }

  @Patch(':id')
  update(
    @Param('id', IdPipe) id: number,
    @Body() dto: UpdateCorrectiveActionDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.cars.update(id, dto, actor);
  }
}
