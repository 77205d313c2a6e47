import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsOptional, IsString, MaxLength, ValidateNested } from 'class-validator';
import { RETURN_STATUSES, type ReturnStatus } from '../entities/vendor-return.entity';
import { ReturnCostsDto } from './return-costs.dto';

export class UpdateReturnDto {
  @ApiPropertyOptional({
    enum: RETURN_STATUSES,
    description: 'draft → sent → acknowledged → closed',
  })
  @IsOptional()
  @IsIn(RETURN_STATUSES, { message: `status must be one of ${RETURN_STATUSES.join(', ')}` })
  readonly status?: ReturnStatus;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(64, { message: 'rmaNumber must be at most 64 characters' })
  readonly rmaNumber?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(4000, { message: 'notes must be at most 4000 characters' })
  readonly notes?: string;

  @ApiPropertyOptional({ type: ReturnCostsDto, description: 'Replaces the costs' })
  @IsOptional()
  @ValidateNested()
  @Type(() => ReturnCostsDto)
  readonly costs?: ReturnCostsDto;
}
