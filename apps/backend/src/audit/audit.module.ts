import { Global, Module } from '@nestjs/common';
import { AuditService } from './audit.service';

/** The audit trail's writer, global: every domain records through it. */
@Global()
@Module({
  providers: [AuditService],
  exports: [AuditService],
})
export class AuditModule {}
