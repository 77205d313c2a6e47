import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Max, Min, ValidateIf, IsNumber, IsPositive, Matches } from 'class-validator';
import { INSTRUMENT_KINDS, type InstrumentKind } from '../entities/instrument.entity';
import { RESOLUTION_UNITS, type ResolutionUnit } from '../instrument-rules';
import { OneOf, RequiredName } from '../../common/dto-fields';

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const NUMBER = { allowNaN: false, allowInfinity: false } as const;

export class CreateInstrumentDto {
  @OneOf(INSTRUMENT_KINDS)
  readonly kind: InstrumentKind;

  @RequiredName(TEXT_MAX.name, { example: 'Bench balance B-2' })
  readonly name: string;

  @RequiredName(TEXT_MAX.reference, { example: 'B-2' })
  readonly serial: string;

  @ApiProperty({ example: 0.01, description: 'Smallest step shown, in resolutionUnit' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'resolution must be a number' })
  @IsPositive({ message: 'resolution must be greater than 0' })
  readonly resolution: number;

  @OneOf(RESOLUTION_UNITS)
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
