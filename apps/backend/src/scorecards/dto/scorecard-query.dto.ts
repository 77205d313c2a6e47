import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Matches } from 'class-validator';

const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Received-date range of a scorecard, both ends inclusive (UTC calendar days). */
export class ScorecardQueryDto {
  @ApiPropertyOptional({
    description:
      'First received date counted, YYYY-MM-DD; default: first day of the month 11 months ago',
    example: '2026-01-01',
  })
  @IsOptional()
  @Matches(DATE, { message: 'from must be a date written YYYY-MM-DD' })
  readonly from?: string;

  @ApiPropertyOptional({
    description: 'Last received date counted (inclusive), YYYY-MM-DD; default: today',
    example: '2026-12-31',
  })
  @IsOptional()
  @Matches(DATE, { message: 'to must be a date written YYYY-MM-DD' })
  readonly to?: string;
}
