import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsOptional, IsString, MaxLength, ValidateNested } from 'class-validator';
import { OneOf, OptionalFlag, StepVersion } from '../../common/dto-fields';
import { ConcessionTermsDto } from './concession.dto';
import { DECISION_OUTCOMES, type DecisionOutcome } from '../entities/decision.entity';

export class CreateDecisionDto {
  @OneOf(DECISION_OUTCOMES)
  readonly outcome: DecisionOutcome;

  @ApiProperty({
    description: 'Why; at least 20 characters when against the recommendation or on concession.',
  })
  @IsString({ message: 'reason must be text' })
  @MaxLength(TEXT_MAX.long, { message: `reason must be at most ${TEXT_MAX.long} characters` })
  readonly reason: string;

  @StepVersion('The lot version the decision was taken on (optimistic lock).')
  readonly version: number;

  @OptionalFlag({
    description: 'The QA lead approves a move to reduced inspection when the rules allow it.',
  })
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
