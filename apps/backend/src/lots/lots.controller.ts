import { Body, Controller, Get, Header, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';
import { CreateLotDto } from './dto/create-lot.dto';
import { LotFiltersDto } from './dto/list-lots.dto';
import { LotsService } from './lots.service';

/** Receiving and the lot list. The lot detail (GET /lots/:id) lives with inspection. */
@ApiTags('lots')
@Controller('lots')
export class LotsController {
  constructor(private readonly lots: LotsService) {}

  @Post()
  @Roles('clerk', 'qa_lead', 'admin')
  create(@Body() dto: CreateLotDto, @CurrentUser() actor: RequestUser) {
    return this.lots.create(dto, actor);
  }

  @Get()
  @Roles(...ALL_ROLES)
  list(@Query() query: LotFiltersDto) {
    return this.lots.list(query);
  }

  @Get('export.csv')
  @Roles(...ALL_ROLES)
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="lots.csv"')
  exportCsv(@Query() query: LotFiltersDto, @CurrentUser() actor: RequestUser) {
    return this.lots.exportCsv(query, actor);
  }
}
