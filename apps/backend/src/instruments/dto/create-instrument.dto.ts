import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsIn,
  IsOptional,
  Max,
  Min,
  ValidateIf,
  IsNumber,
  IsPositive,
  IsString,
  Matches,
  MaxLength,
  MinLength,
} from 'class-validator';
import { INSTRUMENT_KINDS, type InstrumentKind } from '../entities/instrument.entity';
import { RESOLUTION_UNITS, type ResolutionUnit } from '../instrument-rules';

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const NUMBER = { allowNaN: false, allowInfinity: false } as const;

export class CreateInstrumentDto {
  @ApiProperty({ enum: INSTRUMENT_KINDS })
  @IsIn(INSTRUMENT_KINDS, { message: `kind must be one of ${INSTRUMENT_KINDS.join(', ')}` })
  readonly kind: InstrumentKind;

  @ApiProperty({ example: 'Bench balance B-2' })
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(TEXT_MAX.name)
  readonly name: string;

  @ApiProperty({ example: 'B-2' })
  @IsString()
  @MinLength(1, { message: 'serial is required' })
  @MaxLength(TEXT_MAX.reference)
  readonly serial: string;

  @ApiProperty({ example: 0.01, description: 'Smallest step shown, in resolutionUnit' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'resolution must be a number' })
  @IsPositive({ message: 'resolution must be greater than 0' })
  readonly resolution: number;

  @ApiProperty({ enum: RESOLUTION_UNITS })
  @IsIn(RESOLUTION_UNITS, {
    message: `resolutionUnit must be one of ${RESOLUTION_UNITS.join(', ')}`,
  })
  readonly resolutionUnit: ResolutionUnit;

  @ApiProperty({ example: '2026-05-01', description: 'YYYY-MM-DD' })
  @Matches(DATE, { message: 'calibratedOn must be a date written YYYY-MM-DD' })
  readonly calibratedOn: string;

  @ApiProperty({ example: '2027-05-01', description: 'YYYY-MM-DD, after calibratedOn' })
  @Matches(DATE, { message: 'calibrationDueOn must be a date written YYYY-MM-DD' })
  readonly calibrationDueOn: string;

  @ApiPropertyOptional({
    nullable: true,
    example: 0.2,
    description: "Stated accuracy, ± % of reading (maker's specification)",
  })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsNumber(NUMBER, { message: 'accuracyPercentOfReading must be a number of percent' })
  @Min(0, { message: 'accuracyPercentOfReading must be 0 or more' })
  @Max(10, {
    message: 'accuracyPercentOfReading must be at most 10 (it is a percentage: 0.2 = 0.2 %)',
  })
  readonly accuracyPercentOfReading?: number | null;

  @ApiPropertyOptional({
    nullable: true,
    example: 0.02,
    description: 'Stated accuracy, ± a fixed amount in resolutionUnit',
  })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsNumber(NUMBER, { message: 'accuracyAbsolute must be a number in the instrument unit' })
  @Min(0, { message: 'accuracyAbsolute must be 0 or more' })
  readonly accuracyAbsolute?: number | null;

  @ApiPropertyOptional({
    nullable: true,
    example: 0.05,
    description: "Calibration certificate's expanded uncertainty (k = 2), in resolutionUnit",
  })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsNumber(NUMBER, { message: 'calibrationUncertainty must be a number in the instrument unit' })
  @Min(0, { message: 'calibrationUncertainty must be 0 or more' })
  readonly calibrationUncertainty?: number | null;
}
