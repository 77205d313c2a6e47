import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  Min,
  MinLength,
} from 'class-validator';
import { CAR_STATUSES, type CorrectiveActionStatus } from '../entities/corrective-action.entity';

export class UpdateCorrectiveActionDto {
  @ApiProperty({ description: 'The version the change was made on; a stale one gets 409' })
  @IsInt({ message: 'version must be a whole number' })
  @Min(1, { message: 'version must be a whole number' })
  readonly version: number;

  @ApiPropertyOptional({
    enum: CAR_STATUSES,
    description: 'open → responded → verified | reopened; reopened → responded; verified → closed',
  })
  @IsOptional()
  @IsIn(CAR_STATUSES, { message: `status must be one of ${CAR_STATUSES.join(', ')}` })
  readonly status?: CorrectiveActionStatus;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MinLength(TEXT_MIN.problem, {
    message: `problem must be at least ${TEXT_MIN.problem} characters`,
  })
  @MaxLength(TEXT_MAX.long, { message: `problem must be at most ${TEXT_MAX.long} characters` })
  readonly problem?: string;

  @ApiPropertyOptional({ example: '2026-12-31' })
  @IsOptional()
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'dueOn must be a date YYYY-MM-DD' })
  readonly dueOn?: string;

  @ApiPropertyOptional({ description: 'Reopen: what more the supplier must do (e-mailed to it)' })
  @IsOptional()
  @IsString()
  @MinLength(TEXT_MIN.answer, {
    message: `comment must be at least ${TEXT_MIN.answer} characters`,
  })
  @MaxLength(TEXT_MAX.long, { message: `comment must be at most ${TEXT_MAX.long} characters` })
  readonly comment?: string;

  @ApiPropertyOptional({ description: 'Verify: the evidence the fix works' })
  @IsOptional()
  @IsString()
  @MinLength(TEXT_MIN.answer, {
    message: `verificationNote must be at least ${TEXT_MIN.answer} characters`,
  })
  @MaxLength(TEXT_MAX.long, {
    message: `verificationNote must be at most ${TEXT_MAX.long} characters`,
  })
  readonly verificationNote?: string;

  @ApiPropertyOptional({ description: 'Verify: a later lot of the supplier that passed' })
  @IsOptional()
  @IsInt({ message: 'verifiedLotId must be a whole number' })
  @Min(1, { message: 'verifiedLotId must be a whole number' })
  readonly verifiedLotId?: number;

  @ApiPropertyOptional({ description: "The supplier's containment of suspect stock" })
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `containment must be at most ${TEXT_MAX.long} characters` })
  readonly containment?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `rootCause must be at most ${TEXT_MAX.long} characters` })
  readonly rootCause?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.long, {
    message: `correctiveAction must be at most ${TEXT_MAX.long} characters`,
  })
  readonly correctiveAction?: string;
}
