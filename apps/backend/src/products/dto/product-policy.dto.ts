import { LENGTH_PER_UNIT_M, MIN_AREA_RATIO } from '@gaugeproof/api-types';
import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  AQLS,
  INSPECTION_LEVELS,
  MAX_AQL_NONCONFORMING_UNITS,
  type Aql,
  type InspectionLevel,
} from '@gaugeproof/standards';
import { IsIn, IsNumber, IsOptional, Max, Min, ValidateIf } from 'class-validator';
import { OptionalFlag, OptionalOneOf } from '../../common/dto-fields';

/**
 * AQLs a plan that counts nonconforming units may use: 10 and below (ANSI/ASQ Z1.4;
 * ISO 2859-1: larger AQLs are for nonconformities per 100 units).
 */
const UNIT_AQLS = AQLS.filter((a) => Number(a) <= MAX_AQL_NONCONFORMING_UNITS);

/** The inspection policy and unit length of a product, each with its default. */
const RATIO = `minAreaRatio must be from ${MIN_AREA_RATIO.min} to ${MIN_AREA_RATIO.max.toFixed(1)}`;

export class ProductPolicyDto {
  @ApiPropertyOptional({ nullable: true, description: 'Metres of cable in one unit' })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsNumber(
    { allowNaN: false, allowInfinity: false },
    { message: 'lengthPerUnitM must be a number' },
  )
  @Min(LENGTH_PER_UNIT_M.min, { message: 'lengthPerUnitM must be greater than 0' })
  @Max(LENGTH_PER_UNIT_M.max, {
    message: `lengthPerUnitM must be at most ${LENGTH_PER_UNIT_M.max}`,
  })
  readonly lengthPerUnitM?: number | null;

  @OptionalOneOf(INSPECTION_LEVELS, { default: 'S-3' })
  readonly inspectionLevel?: InspectionLevel;

  @ApiPropertyOptional({ enum: UNIT_AQLS, default: '1.0' })
  @IsOptional()
  @IsIn(AQLS, { message: `aql must be one of ${UNIT_AQLS.join(', ')}` })
  @IsIn(UNIT_AQLS, {
    message: `aql must be 10 or below: our plans count nonconforming units, and ANSI/ASQ Z1.4 and ISO 2859-1 give AQLs above 10 for nonconformities per 100 units only`,
  })
  readonly aql?: Aql;

  /** 0.98 by default (ASTM B496 area tolerance); below 0.5 is no longer a size check. */
  @ApiPropertyOptional({ minimum: 0.5, maximum: 1, default: 0.98 })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'minAreaRatio must be a number' })
  @Min(MIN_AREA_RATIO.min, { message: RATIO })
  @Max(MIN_AREA_RATIO.max, { message: RATIO })
  readonly minAreaRatio?: number;

  /** A concession against a reject needs a second QA lead or an admin (default on). */
  @OptionalFlag({ default: true })
  readonly concessionNeedsApproval?: boolean;
}
