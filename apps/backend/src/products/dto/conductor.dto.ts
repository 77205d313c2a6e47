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

export class ConductorDto {
  @ApiProperty({ enum: CONDUCTOR_PURPOSES })
  @IsIn(CONDUCTOR_PURPOSES, { message: `purpose must be one of ${CONDUCTOR_PURPOSES.join(', ')}` })
  readonly purpose: ConductorPurpose;

  @ApiProperty({ example: '4 AWG', description: 'Any label parseGauge reads: 4, 1/0, 25 mm²' })
  @IsString({ message: 'gauge must be a label such as "4 AWG"' })
  @MinLength(1, { message: 'gauge is required' })
  @MaxLength(32, { message: 'gauge must be at most 32 characters' })
  readonly gauge: string;

  @ApiProperty({ enum: CLAIMED_MATERIALS })
  @IsIn(CLAIMED_MATERIALS, {
    message: `claimedMaterial must be one of ${CLAIMED_MATERIALS.join(', ')}`,
  })
  readonly claimedMaterial: ClaimedMaterial;

  @ApiPropertyOptional({ nullable: true, example: 665 })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsInt({ message: 'claimedStrands must be a whole number from 1 to 100000' })
  @Min(1, { message: 'claimedStrands must be a whole number from 1 to 100000' })
  @Max(100_000, { message: 'claimedStrands must be a whole number from 1 to 100000' })
  readonly claimedStrands?: number | null;

  @ApiPropertyOptional({
    nullable: true,
    enum: [1, 2, 5, 6],
    description: 'IEC 60228 class of a metric conductor (default 5); not for AWG sizes',
  })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsIn([1, 2, 5, 6], { message: 'conductorClass must be 1, 2, 5 or 6 (IEC 60228 classes)' })
  readonly conductorClass?: number | null;
}
