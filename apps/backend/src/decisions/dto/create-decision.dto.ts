import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsString, MaxLength, ValidateNested } from 'class-validator';
import { StepVersion } from '../../common/dto-fields';
import { ConcessionTermsDto } from './concession.dto';
import { DECISION_OUTCOMES, type DecisionOutcome } from '../entities/decision.entity';

export class CreateDecisionDto {
  @ApiProperty({ enum: DECISION_OUTCOMES })
  @IsIn(DECISION_OUTCOMES, { message: `outcome must be one of ${DECISION_OUTCOMES.join(', ')}` })
  readonly outcome: DecisionOutcome;

  @ApiProperty({
    description: 'Why; at least 20 characters when against the recommendation or on concession.',
  })
  @IsString({ message: 'reason must be text' })
  @MaxLength(TEXT_MAX.long, { message: `reason must be at most ${TEXT_MAX.long} characters` })
  readonly reason: string;

  @StepVersion('The lot version the decision was taken on (optimistic lock).')
  readonly version: number;

  @ApiPropertyOptional({
    description: 'The QA lead approves a move to reduced inspection when the rules allow it.',
  })
  @IsOptional()
  @IsBoolean({ message: 'approveReduced must be true or false' })
  readonly approveReduced?: boolean;

  @ApiPropertyOptional({
    type: ConcessionTermsDto,
    description: 'Required with accept_on_concession: what for, how much, until when.',
  })
  @IsOptional()
  @ValidateNested()
  @Type(() => ConcessionTermsDto)
  readonly concession?: ConcessionTermsDto;
}
