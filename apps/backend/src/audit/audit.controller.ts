import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators';
import { ALL_ROLES } from '../auth/roles';
import { AuditQueryService } from './audit-query.service';
import { ListAuditDto } from './dto/list-audit.dto';
import { IdPipe } from '../common/id.pipe';

/** The audit trail is read-only through the API: no route changes or deletes an event. */
@ApiTags('audit')
@Controller()
export class AuditController {
  constructor(private readonly audit: AuditQueryService) {}

  @Get('lots/:id/timeline')
  @Roles(...ALL_ROLES)
  timeline(@Param('id', IdPipe) id: number) {
    return this.audit.timeline(id);
  }

  @Get('audit')
  @Roles('admin')
  list(@Query() q: ListAuditDto) {
    return this.audit.list(q);
  }
}
