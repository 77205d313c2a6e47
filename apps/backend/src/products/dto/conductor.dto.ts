import {
  CLAIMED_STRANDS,
  CONDUCTOR_CLASSES,
  PRODUCT_CONDUCTORS,
  TEXT_MAX,
} from '@gaugeproof/api-types';
import { Type } from 'class-transformer';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import {
  CLAIMED_MATERIALS,
  CONDUCTOR_PURPOSES,
  type ClaimedMaterial,
  type ConductorPurpose,
} from '../entities/conductor-spec.entity';
import { OneOf, stacked } from '../../common/dto-fields';

const STRANDS = `claimedStrands must be a whole number from ${CLAIMED_STRANDS.min} to ${CLAIMED_STRANDS.max}`;

export class ConductorDto {
  @OneOf(CONDUCTOR_PURPOSES)
  readonly purpose: ConductorPurpose;

  @ApiProperty({ example: '4 AWG', description: 'Any label parseGauge reads: 4, 1/0, 25 mm²' })
  @IsString({ message: 'gauge must be a label such as "4 AWG"' })
  @MinLength(1, { message: 'gauge is required' })
  @MaxLength(TEXT_MAX.gauge, { message: `gauge must be at most ${TEXT_MAX.gauge} characters` })
  readonly gauge: string;

  @OneOf(CLAIMED_MATERIALS)
  readonly claimedMaterial: ClaimedMaterial;

  @ApiPropertyOptional({ nullable: true, example: 665 })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsInt({ message: STRANDS })
  @Min(CLAIMED_STRANDS.min, { message: STRANDS })
  @Max(CLAIMED_STRANDS.max, { message: STRANDS })
  readonly claimedStrands?: number | null;

  @ApiPropertyOptional({
    nullable: true,
    enum: CONDUCTOR_CLASSES,
    description: 'IEC 60228 class of a metric conductor (default 5); not for AWG sizes',
  })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsIn(CONDUCTOR_CLASSES, {
    message: `conductorClass must be ${CONDUCTOR_CLASSES.slice(0, -1).join(', ')} or ${CONDUCTOR_CLASSES.at(-1)} (IEC 60228 classes)`,
  })
  readonly conductorClass?: number | null;
}

/** A product's conductors (1 to PRODUCT_CONDUCTORS.max), each checked as a ConductorDto. */
export const ConductorList = () =>
  stacked(
    IsArray({ message: 'conductors must hold at least one conductor' }),
    ArrayMinSize(PRODUCT_CONDUCTORS.min, {
      message: 'conductors must hold at least one conductor',
    }),
    ArrayMaxSize(PRODUCT_CONDUCTORS.max, {
      message: `conductors can hold at most ${PRODUCT_CONDUCTORS.max} conductors`,
    }),
    ValidateNested({ each: true }),
    Type(() => ConductorDto),
  );
