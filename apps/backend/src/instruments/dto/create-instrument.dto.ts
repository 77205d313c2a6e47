import { ApiProperty } from '@nestjs/swagger';
import {
  IsIn,
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

export class CreateInstrumentDto {
  @ApiProperty({ enum: INSTRUMENT_KINDS })
  @IsIn(INSTRUMENT_KINDS, { message: `kind must be one of ${INSTRUMENT_KINDS.join(', ')}` })
  readonly kind: InstrumentKind;

  @ApiProperty({ example: 'Bench balance B-2' })
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(120)
  readonly name: string;

  @ApiProperty({ example: 'B-2' })
  @IsString()
  @MinLength(1, { message: 'serial is required' })
  @MaxLength(64)
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
}
