import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';

/** Paper sizes the evidence pack lays out for: ISO A4 and US Letter. */
export const PAPER_SIZES = ['a4', 'letter'] as const;

export class EvidenceQueryDto {
  @ApiPropertyOptional({ enum: PAPER_SIZES, description: 'Paper size; A4 unless letter' })
  @IsOptional()
  @IsIn(PAPER_SIZES, { message: 'paper must be a4 or letter' })
  readonly paper?: (typeof PAPER_SIZES)[number];
}
