import { Answers, PostAction } from '../common/answers';
import { Body, Controller, Get, Post, Res } from '@nestjs/common';
import type { Response } from 'express';
import { ALL_ROLES } from '../auth/roles';
import { ReviewConcessionDto } from './dto/concession.dto';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { DecisionsService } from './decisions.service';
import { CreateDecisionDto } from './dto/create-decision.dto';
import { RestoreInspectionStateDto } from './dto/restore-inspection-state.dto';
import { IdParam } from '../common/id.pipe';

@ApiTags('decisions')
@Controller()
@Roles('qa_lead', 'admin')
export class DecisionsController {
  constructor(private readonly decisions: DecisionsService) {}

  /**
   * 201 with the decision; 202 when it is a concession against a reject recommendation
   * that waits for a second QA lead's or an admin's approval (nothing decided yet).
   */
  @Post('lots/:id/decisions')
  @Answers('DecisionResult', 202)
  async decide(
    @IdParam() id: number,
    @Body() dto: CreateDecisionDto,
    @CurrentUser() actor: RequestUser,
    @Res({ passthrough: true }) res: Response,
  ) {
    const result = await this.decisions.decide(id, dto, actor);
    if (result.pendingApproval) res.status(202);
    return result;
  }

  @Get('lots/:id/concessions')
  @Answers('ConcessionList')
  @Roles(...ALL_ROLES)
  concessions(@IdParam() id: number) {
    return this.decisions.concessionsOf(id);
  }

  /**
   * Concessions waiting for a second approval that the caller may give (their own left
   * out), oldest first: the QA lead's and admin's Today list.
   */
  @Get('concessions/awaiting-approval')
  @Answers('ConcessionsAwaitingApproval')
  awaitingApproval(@CurrentUser() actor: RequestUser) {
    return this.decisions.awaitingApproval(actor);
  }

  /** A second QA lead or an admin puts a pending concession in force (not its requester). */
  @PostAction('concessions/:id/approve', 'DecisionResult')
  approve(
    @IdParam() id: number,
    @Body() dto: ReviewConcessionDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.decisions.approve(id, dto, actor);
  }

  @PostAction('concessions/:id/refuse', 'Concession')
  refuse(
    @IdParam() id: number,
    @Body() dto: ReviewConcessionDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.decisions.refuse(id, dto, actor);
  }

  /** Brings a discontinued stream back on tightened inspection (ISO 2859-1). */
  @Post('products/:id/inspection-state/restore')
  @Answers('RestoreAnswer')
  restore(
    @IdParam() id: number,
    @Body() dto: RestoreInspectionStateDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.decisions.restore(id, dto.reason.trim(), actor);
  }
}
