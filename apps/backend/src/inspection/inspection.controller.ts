import { Answers, PostAction } from '../common/answers';
import { Body, Controller, Get, Post } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { CreateReadingDto } from './dto/create-reading.dto';
import { CreateSampleDto } from './dto/create-sample.dto';
import { VoidReadingDto } from './dto/void-reading.dto';
import { ReadingsService } from './readings.service';
import { SamplesService } from './samples.service';
import { lotsAtRejectNumber } from './reject-reached';
import { IdParam } from '../common/id.pipe';

@ApiTags('inspection')
@Controller()
export class InspectionController {
  constructor(
    private readonly samples: SamplesService,
    private readonly readings: ReadingsService,
    private readonly em: EntityManager,
  ) {}

  /** Lots awaiting a decision that already reached their reject number (Today, QA lead). */
  @Get('inspection/reject-reached')
  @Answers('RejectReached')
  @Roles('qa_lead', 'admin')
  rejectReached() {
    return lotsAtRejectNumber(this.em);
  }

  @Post('lots/:id/samples')
  @Answers('Sample')
  @Roles('clerk', 'qa_lead', 'admin')
  createSample(
    @IdParam() lotId: number,
    @Body() dto: CreateSampleDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.samples.create(lotId, dto, actor);
  }

  @Post('samples/:id/readings')
  @Answers('Reading')
  @Roles('clerk', 'qa_lead', 'admin')
  createReading(
    @IdParam() sampleId: number,
    @Body() dto: CreateReadingDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.readings.create(sampleId, dto, actor);
  }

  @PostAction('readings/:id/void', 'Reading')
  // A clerk only their own reading, before the lot is decided (ReadingsService.void).
  @Roles('clerk', 'qa_lead', 'admin')
  voidReading(
    @IdParam() id: number,
    @Body() dto: VoidReadingDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.readings.void(id, dto, actor);
  }
}
