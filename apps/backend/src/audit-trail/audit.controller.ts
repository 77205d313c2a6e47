import { Answers } from '../common/answers';
import { Controller, Get, Param, Query, StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { attachmentName, CSV_CONTENT_TYPE, csvStream } from '../common/csv';
import { ALL_ROLES } from '../auth/roles';
import { AUDIT_CSV_COLUMNS, AuditQueryService } from './audit-query.service';
import { ListAuditDto } from './dto/list-audit.dto';
import { IdPipe } from '../common/id.pipe';

/** The audit trail is read-only through the API: no route changes or deletes an event. */
@ApiTags('audit')
@Controller()
export class AuditController {
  constructor(private readonly audit: AuditQueryService) {}

  @Get('lots/:id/timeline')
  @Answers('TimelineEventList')
  @Roles(...ALL_ROLES)
  timeline(@Param('id', IdPipe) id: number) {
    return this.audit.timeline(id);
  }

  @Get('audit')
  @Answers('TimelineEventPage')
  @Roles('admin')
  list(@Query() q: ListAuditDto) {
    return this.audit.list(q);
  }

  @Get('audit/facets')
  @Answers('AuditFacets')
  @Roles('admin')
  facets() {
    return this.audit.facets();
  }

  /** The same filters and sort as the list, every matching event; audited as audit.export. */
  @Get('audit/export.csv')
  @Answers.file('text/csv')
  @Roles('admin')
  async exportCsv(@Query() q: ListAuditDto, @CurrentUser() actor: RequestUser) {
    const rows = await this.audit.exportRows(q, actor);
    return new StreamableFile(csvStream(AUDIT_CSV_COLUMNS, rows), {
      type: CSV_CONTENT_TYPE,
      disposition: attachmentName('audit-trail.csv'),
    });
  }
}
