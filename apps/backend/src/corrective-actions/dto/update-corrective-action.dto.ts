import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
import {
  IsDay,
  IsWholeFromOne,
  OptionalOneOf,
  OptionalText,
  StepVersion,
} from '../../common/dto-fields';
import { CAR_STATUSES, type CorrectiveActionStatus } from '../entities/corrective-action.entity';

export class UpdateCorrectiveActionDto {
  @StepVersion('The version the change was made on; a stale one gets 409')
  readonly version: number;

  @OptionalOneOf(CAR_STATUSES, {
    description: 'open → responded → verified | reopened; reopened → responded; verified → closed',
  })
  readonly status?: CorrectiveActionStatus;

  @OptionalText(TEXT_MAX.long, undefined, TEXT_MIN.problem)
  readonly problem?: string;

  @ApiPropertyOptional({ example: '2026-12-31' })
  @IsOptional()
  @IsDay()
  readonly dueOn?: string;

  @OptionalText(
    TEXT_MAX.long,
    { description: 'Reopen: what more the supplier must do (e-mailed to it)' },
    TEXT_MIN.answer,
  )
  readonly comment?: string;

  @OptionalText(
    TEXT_MAX.long,
    { description: 'Verify: the evidence the fix works' },
    TEXT_MIN.answer,
  )
  readonly verificationNote?: string;

  @ApiPropertyOptional({ description: 'Verify: a later lot of the supplier that passed' })
  @IsOptional()
  @IsWholeFromOne()
  readonly verifiedLotId?: number;

  @OptionalText(TEXT_MAX.long, { description: "The supplier's containment of suspect stock" })
  readonly containment?: string;

  @OptionalText(TEXT_MAX.long)
  readonly rootCause?: string;

  @OptionalText(TEXT_MAX.long)
  readonly correctiveAction?: string;
}
