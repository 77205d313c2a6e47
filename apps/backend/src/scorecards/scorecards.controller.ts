import { Answers } from '../common/answers';
import { Controller, Get, Header, Param, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ScorecardQueryDto } from './dto/scorecard-query.dto';
import { resolveRange } from './scorecard-range';
import { ScorecardExportService } from './scorecard-export.service';
import { ScorecardsService } from './scorecards.service';
import { IdPipe } from '../common/id.pipe';

const CSV = 'text/csv; charset=utf-8';

/** Full paths: the supplier's scorecard lives under /suppliers but belongs to this module. */
@ApiTags('scorecards')
@Controller()
@Roles('purchasing', 'qa_lead', 'admin')
export class ScorecardsController {
  constructor(
    private readonly scorecards: ScorecardsService,
    private readonly exports: ScorecardExportService,
  ) {}

  @Get('scorecards')
  @Answers('ScorecardList')
  list(@Query() q: ScorecardQueryDto) {
    return this.scorecards.list(resolveRange(q.from, q.to));
  }

  @Get('scorecards/export.csv')
  @Answers.file('text/csv')
  @Header('Content-Type', CSV)
  @Header('Content-Disposition', 'attachment; filename="scorecards.csv"')
  exportList(@Query() q: ScorecardQueryDto, @CurrentUser() actor: RequestUser) {
    return this.exports.list(resolveRange(q.from, q.to), actor);
  }

  @Get('suppliers/:id/scorecard')
  @Answers('SupplierScorecard')
  forSupplier(@Param('id', IdPipe) id: number, @Query() q: ScorecardQueryDto) {
    return this.scorecards.forSupplier(id, resolveRange(q.from, q.to));
  }

  @Get('suppliers/:id/scorecard/export.csv')
  @Answers.file('text/csv')
  @Header('Content-Type', CSV)
  @Header('Content-Disposition', 'attachment; filename="supplier-scorecard.csv"')
  exportSupplier(
    @Param('id', IdPipe) id: number,
    @Query() q: ScorecardQueryDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.exports.supplier(id, resolveRange(q.from, q.to), actor);
  }
}
