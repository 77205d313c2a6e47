import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  Min,
  MinLength,
} from 'class-validator';

/** The terms of a concession, given with an accept-on-concession decision. */
export class ConcessionTermsDto {
  @ApiProperty({ description: 'What the material may be used for' })
  @IsString({ message: 'scope must be text' })
  @MinLength(10, {
    message: 'scope must say in at least 10 characters what the material may be used for',
  })
  @MaxLength(1000, { message: 'scope must be at most 1000 characters' })
  readonly scope: string;

  @ApiProperty({ description: "How much of the lot, in the lot's unit" })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'quantity must be a number' })
  @Min(0.001, { message: 'quantity must be greater than 0' })
  readonly quantity: number;

  @ApiProperty({ description: 'Last day the concession holds, YYYY-MM-DD' })
  @IsString({ message: 'expiresOn must be a date YYYY-MM-DD' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'expiresOn must be a date YYYY-MM-DD' })
  readonly expiresOn: string;
}

export class ReviewConcessionDto {
  @ApiProperty({ description: 'The concession version looked at (optimistic lock)' })
  @IsInt({ message: 'version must be a whole number' })
  @Min(1, { message: 'version must be a whole number' })
  readonly version: number;

  @ApiPropertyOptional({ description: 'Why (required to refuse: at least 10 characters)' })
  @IsOptional()
  @IsString({ message: 'note must be text' })
  @MaxLength(2000, { message: 'note must be at most 2000 characters' })
  readonly note?: string;
}
