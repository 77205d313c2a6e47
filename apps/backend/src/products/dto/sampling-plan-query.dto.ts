import { LOT_QUANTITY } from '@gaugeproof/api-types';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsWholeNumber } from '../../common/validators';

/**
 * A lot has at least one unit: a lot of one (a single drum) is inspected whole
 * (INSPECT_ALL_RULE of the standards library; ANSI/ASQ Z1.4 / ISO 2859-1).
 */
export const LOT_QUANTITY_MESSAGE = `quantity must be a whole number of at least ${LOT_QUANTITY.min}`;
/** The contract's bound (libs/api-types LOT_QUANTITY). */
export const LOT_QUANTITY_MAX = LOT_QUANTITY.max;

export function lotQuantityMessage(args: { value: unknown }): string {
  return typeof args.value === 'number' && args.value > LOT_QUANTITY_MAX
    ? `quantity must be at most ${LOT_QUANTITY_MAX}`
    : LOT_QUANTITY_MESSAGE;
}

export class SamplingPlanQueryDto {
  @ApiProperty({ minimum: LOT_QUANTITY.min, maximum: LOT_QUANTITY_MAX, example: 500 })
  @Type(() => Number)
  @IsWholeNumber(LOT_QUANTITY.min, LOT_QUANTITY_MAX, { message: lotQuantityMessage })
  readonly quantity: number;
}
