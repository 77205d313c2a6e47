import { Module } from '@nestjs/common';
import { ReturnsModule } from '../returns/returns.module';
import { SupplierPortalController } from './supplier-portal.controller';
import { PortalThrottle } from './portal-throttle';
import { SupplierPortalService } from './supplier-portal.service';

/** The supplier's page for a SCAR or a return notice, reached by a signed link. */
@Module({
  imports: [ReturnsModule],
  controllers: [SupplierPortalController],
  providers: [SupplierPortalService, PortalThrottle],
  exports: [SupplierPortalService, PortalThrottle],
})
export class SupplierPortalModule {}
