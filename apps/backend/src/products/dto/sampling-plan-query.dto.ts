import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsWholeNumber } from '../../common/validators';

/**
 * A lot has at least one unit: a lot of one (a single drum) is inspected whole
 * (INSPECT_ALL_RULE of the standards library; ANSI/ASQ Z1.4 / ISO 2859-1).
 */
export const LOT_QUANTITY_MESSAGE = 'quantity must be a whole number of at least 1';
/** Far above any delivery; keeps the number exact (common practice, no source). */
export const LOT_QUANTITY_MAX = 10_000_000;

export function lotQuantityMessage(args: { value: unknown }): string {
  return typeof args.value === 'number' && args.value > LOT_QUANTITY_MAX
    ? `quantity must be at most ${LOT_QUANTITY_MAX}`
    : LOT_QUANTITY_MESSAGE;
}

export class SamplingPlanQueryDto {
  @ApiProperty({ minimum: 1, maximum: LOT_QUANTITY_MAX, example: 500 })
  @Type(() => Number)
  @IsWholeNumber(1, LOT_QUANTITY_MAX, { message: lotQuantityMessage })
  readonly quantity: number;
}
