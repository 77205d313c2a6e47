import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Matches } from 'class-validator';

const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Received-date range of the lots whose readings are exported, both ends inclusive (UTC). */
export class ReadingsExportQueryDto {
  @ApiPropertyOptional({
    description: 'First received date included, YYYY-MM-DD; default: the first lot',
    example: '2026-01-01',
  })
  @IsOptional()
  @Matches(DATE, { message: 'from must be a date written YYYY-MM-DD' })
  readonly from?: string;

  @ApiPropertyOptional({
    description: 'Last received date included, YYYY-MM-DD; default: the latest lot',
    example: '2026-12-31',
  })
  @IsOptional()
  @Matches(DATE, { message: 'to must be a date written YYYY-MM-DD' })
  readonly to?: string;
}
