import { Module } from '@nestjs/common';
import { AuditController } from './audit.controller';
import { AuditQueryService } from './audit-query.service';

/** The audit trail as staff read it: the list, a record's timeline, the CSV. */
@Module({
  controllers: [AuditController],
  providers: [AuditQueryService],
})
export class AuditTrailModule {}
