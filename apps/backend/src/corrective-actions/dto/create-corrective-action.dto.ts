import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  ArrayUnique,
  IsArray,
  IsInt,
  IsString,
  Matches,
  MaxLength,
  Min,
  MinLength,
} from 'class-validator';

export class CreateCorrectiveActionDto {
  @ApiProperty()
  @IsInt({ message: 'supplierId must be a whole number' })
  @Min(1, { message: 'supplierId must be a whole number' })
  readonly supplierId: number;

  @ApiProperty({ type: [Number], description: 'Lots of that supplier the problem was found on' })
  @IsArray({ message: 'lotIds must be a list of lot ids' })
  @ArrayMaxSize(100, { message: 'lotIds can name at most 100 lots' })
  @ArrayUnique({ message: 'lotIds must not repeat a lot' })
  @IsInt({ each: true, message: 'each lot id must be a whole number' })
  @Min(1, { each: true, message: 'each lot id must be a whole number' })
  readonly lotIds: number[];

  @ApiProperty({ description: 'What was found, at least 10 characters' })
  @IsString({ message: 'problem must be text' })
  @MinLength(TEXT_MIN.problem, {
    message: `problem must be at least ${TEXT_MIN.problem} characters`,
  })
  @MaxLength(TEXT_MAX.long, { message: `problem must be at most ${TEXT_MAX.long} characters` })
  readonly problem: string;

  @ApiProperty({
    example: '2026-12-31',
    description: "The supplier's response is due (YYYY-MM-DD)",
  })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'dueOn must be a date YYYY-MM-DD' })
  readonly dueOn: string;
}
