import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, Matches, Max, MaxLength, Min } from 'class-validator';
import { ListQueryDto } from '../../common/paging';

const DAY_OR_INSTANT = /^\d{4}-\d{2}-\d{2}(T[\d:.]+Z)?$/;

export class ListAuditDto extends ListQueryDto {
  @ApiPropertyOptional({ example: 'lot' })
  @IsOptional()
  @IsString()
  @MaxLength(48)
  readonly entityType?: string;

  @ApiPropertyOptional({ description: 'Id of the record (with entityType: one record)' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'entityId must be a whole number' })
  @Min(1, { message: 'entityId must be a whole number' })
  @Max(Number.MAX_SAFE_INTEGER, { message: 'entityId must be a whole number' })
  readonly entityId?: number;

  @ApiPropertyOptional({ example: 'decision.create' })
  @IsOptional()
  @IsString()
  @MaxLength(48)
  readonly action?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'actorId must be a whole number' })
  @Min(1, { message: 'actorId must be a whole number' })
  readonly actorId?: number;

  @ApiPropertyOptional({ description: 'YYYY-MM-DD or an ISO instant, inclusive' })
  @IsOptional()
  @Matches(DAY_OR_INSTANT, { message: 'from must be a date YYYY-MM-DD or an ISO instant' })
  readonly from?: string;

  @ApiPropertyOptional({ description: 'YYYY-MM-DD (the whole day) or an ISO instant, inclusive' })
  @IsOptional()
  @Matches(DAY_OR_INSTANT, { message: 'to must be a date YYYY-MM-DD or an ISO instant' })
  readonly to?: string;
}
