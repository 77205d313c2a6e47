import { Answers } from '../common/answers';
import { Body, Controller, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';
import { CreateInstrumentDto } from './dto/create-instrument.dto';
import { ListInstrumentsDto } from './dto/list-instruments.dto';
import { UpdateInstrumentDto } from './dto/update-instrument.dto';
import { InstrumentsService } from './instruments.service';
import { IdParam } from '../common/id.pipe';

@ApiTags('instruments')
@Controller('instruments')
export class InstrumentsController {
  constructor(private readonly instruments: InstrumentsService) {}

  @Get()
  @Answers('InstrumentPage')
  @Roles(...ALL_ROLES)
  list(@Query() query: ListInstrumentsDto) {
    return this.instruments.list(query);
  }

  @Get(':id')
  @Answers('Instrument')
  @Roles(...ALL_ROLES)
  get(@IdParam() id: number) {
    return this.instruments.get(id);
  }

  @Post()
  @Answers('Instrument')
  @Roles('qa_lead', 'admin')
  create(@Body() dto: CreateInstrumentDto, @CurrentUser() actor: RequestUser) {
    return this.instruments.create(dto, actor);
  }

  @Patch(':id')
  @Answers('Instrument')
  @Roles('qa_lead', 'admin')
  update(
    @IdParam() id: number,
    @Body() dto: UpdateInstrumentDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.instruments.update(id, dto, actor);
  }
}
