import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsNumber, IsOptional, IsString, MaxLength, Min, MinLength } from 'class-validator';
import { IsDay, StepVersion } from '../../common/dto-fields';

/** The terms of a concession, given with an accept-on-concession decision. */
export class ConcessionTermsDto {
  @ApiProperty({ description: 'What the material may be used for' })
  @IsString({ message: 'scope must be text' })
  @MinLength(TEXT_MIN.answer, {
    message: `scope must say in at least ${TEXT_MIN.answer} characters what the material may be used for`,
  })
  @MaxLength(TEXT_MAX.scope, { message: `scope must be at most ${TEXT_MAX.scope} characters` })
  readonly scope: string;

  @ApiProperty({ description: "How much of the lot, in the lot's unit" })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'quantity must be a number' })
  @Min(0.001, { message: 'quantity must be greater than 0' })
  readonly quantity: number;

  @ApiProperty({ description: 'Last day the concession holds, YYYY-MM-DD' })
  @IsString({ message: 'expiresOn must be a date YYYY-MM-DD' })
  @IsDay()
  readonly expiresOn: string;
}

export class ReviewConcessionDto {
  @StepVersion('The concession version looked at (optimistic lock)')
  readonly version: number;

  @ApiPropertyOptional({ description: 'Why (required to refuse: at least 10 characters)' })
  @IsOptional()
  @IsString({ message: 'note must be text' })
  @MaxLength(TEXT_MAX.reason, { message: `note must be at most ${TEXT_MAX.reason} characters` })
  readonly note?: string;
}
