import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsNumber, IsOptional, IsString, MaxLength, Max, Min, MinLength } from 'class-validator';
import { IsDay, OptionalText, RequiredText, StepVersion } from '../../common/dto-fields';

/** A step of a return; `version`, when given, must be the current one (else 409). */
export class ReturnStepDto {
  @StepVersion('The version the step was taken on', false)
  readonly version?: number;
}

export class CancelReturnDto extends ReturnStepDto {
  @RequiredText(TEXT_MIN.cancelReason, TEXT_MAX.reason, {
    description: 'Why the return is cancelled (kept in the audit trail)',
  })
  readonly reason: string;
}

export class ShipReturnDto extends ReturnStepDto {
  @RequiredText(TEXT_MIN.carrier, TEXT_MAX.reference, { example: 'Northline Freight' })
  readonly carrier: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'trackingNumber must be text' })
  @MaxLength(TEXT_MAX.reference, {
    message: `trackingNumber must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly trackingNumber?: string;

  @ApiProperty({ example: '2026-12-03' })
  @IsDay()
  readonly shippedOn: string;

  @ApiProperty({ description: "How much went back, in the lots' unit" })
  @IsNumber({ maxDecimalPlaces: 3 }, { message: 'quantity must be a number' })
  @Min(0.001, { message: 'quantity must be more than 0' })
  @Max(100_000_000, { message: 'quantity must be at most 100000000' })
  readonly quantity: number;
}

export class AcknowledgeReturnDto extends ReturnStepDto {
  @OptionalText(TEXT_MAX.reference, {
    description: "The supplier's RMA number, if it came with the answer",
  })
  readonly rmaNumber?: string;
}

export class CreditReturnDto extends ReturnStepDto {
  @ApiProperty({ example: 'CN-20931' })
  @IsString({ message: 'creditNoteNumber must be text' })
  @MinLength(1, { message: 'creditNoteNumber must not be empty' })
  @MaxLength(TEXT_MAX.reference, {
    message: `creditNoteNumber must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly creditNoteNumber: string;

  @ApiProperty({ description: "Amount credited, in the return's currency" })
  @IsNumber(
    { maxDecimalPlaces: 2 },
    { message: 'creditAmount must be a number with at most 2 decimals' },
  )
  @Min(0, { message: 'creditAmount cannot be negative' })
  @Max(10_000_000, { message: 'creditAmount must be at most 10000000' })
  readonly creditAmount: number;
}
