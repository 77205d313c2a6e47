import { Body, Controller, Param, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { DecisionsService } from './decisions.service';
import { CreateDecisionDto } from './dto/create-decision.dto';
import { RestoreInspectionStateDto } from './dto/restore-inspection-state.dto';
import { IdPipe } from '../common/id.pipe';

@ApiTags('decisions')
@Controller()
@Roles('qa_lead', 'admin')
export class DecisionsController {
  constructor(private readonly decisions: DecisionsService) {}

  @Post('lots/:id/decisions')
  decide(
    @Param('id', IdPipe) id: number,
    @Body() dto: CreateDecisionDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.decisions.decide(id, dto, actor);
  }

  /** Brings a discontinued stream back on tightened inspection (ISO 2859-1). */
  @Post('products/:id/inspection-state/restore')
  restore(
    @Param('id', IdPipe) id: number,
    @Body() dto: RestoreInspectionStateDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.decisions.restore(id, dto.reason.trim(), actor);
  }
}
