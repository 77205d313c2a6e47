import { CLAIMED_STRANDS, CONDUCTOR_CLASSES, TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateIf,
} from 'class-validator';
import {
  CLAIMED_MATERIALS,
  CONDUCTOR_PURPOSES,
  type ClaimedMaterial,
  type ConductorPurpose,
} from '../entities/conductor-spec.entity';

const STRANDS = `claimedStrands must be a whole number from ${CLAIMED_STRANDS.min} to ${CLAIMED_STRANDS.max}`;

export class ConductorDto {
  @ApiProperty({ enum: CONDUCTOR_PURPOSES })
  @IsIn(CONDUCTOR_PURPOSES, { message: `purpose must be one of ${CONDUCTOR_PURPOSES.join(', ')}` })
  readonly purpose: ConductorPurpose;

  @ApiProperty({ example: '4 AWG', description: 'Any label parseGauge reads: 4, 1/0, 25 mm²' })
  @IsString({ message: 'gauge must be a label such as "4 AWG"' })
  @MinLength(1, { message: 'gauge is required' })
  @MaxLength(TEXT_MAX.gauge, { message: `gauge must be at most ${TEXT_MAX.gauge} characters` })
  readonly gauge: string;

  @ApiProperty({ enum: CLAIMED_MATERIALS })
  @IsIn(CLAIMED_MATERIALS, {
    message: `claimedMaterial must be one of ${CLAIMED_MATERIALS.join(', ')}`,
  })
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
