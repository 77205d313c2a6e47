import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  Max,
  Min,
  MinLength,
} from 'class-validator';

/** A step of a return; `version`, when given, must be the current one (else 409). */
export class ReturnStepDto {
  @ApiPropertyOptional({ description: 'The version the step was taken on' })
  @IsOptional()
  @IsInt({ message: 'version must be a whole number' })
  @Min(1, { message: 'version must be a whole number' })
  readonly version?: number;
}

export class CancelReturnDto extends ReturnStepDto {
  @ApiProperty({ description: 'Why the return is cancelled (kept in the audit trail)' })
  @IsString({ message: 'reason must be text' })
  @MinLength(TEXT_MIN.cancelReason, {
    message: `reason must be at least ${TEXT_MIN.cancelReason} characters`,
  })
  @MaxLength(TEXT_MAX.reason, { message: `reason must be at most ${TEXT_MAX.reason} characters` })
  readonly reason: string;
}

export class ShipReturnDto extends ReturnStepDto {
  @ApiProperty({ example: 'Northline Freight' })
  @IsString({ message: 'carrier must be text' })
  @MinLength(TEXT_MIN.carrier, {
    message: `carrier must be at least ${TEXT_MIN.carrier} characters`,
  })
  @MaxLength(TEXT_MAX.reference, {
    message: `carrier must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly carrier: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'trackingNumber must be text' })
  @MaxLength(TEXT_MAX.reference, {
    message: `trackingNumber must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly trackingNumber?: string;

  @ApiProperty({ example: '2026-12-03' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'shippedOn must be a date YYYY-MM-DD' })
  readonly shippedOn: string;

  @ApiProperty({ description: "How much went back, in the lots' unit" })
  @IsNumber({ maxDecimalPlaces: 3 }, { message: 'quantity must be a number' })
  @Min(0.001, { message: 'quantity must be more than 0' })
  @Max(100_000_000, { message: 'quantity must be at most 100000000' })
  readonly quantity: number;
}

export class AcknowledgeReturnDto extends ReturnStepDto {
  @ApiPropertyOptional({ description: "The supplier's RMA number, if it came with the answer" })
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.reference, {
    message: `rmaNumber must be at most ${TEXT_MAX.reference} characters`,
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
